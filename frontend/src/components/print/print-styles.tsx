import { GlobalStyles } from '@mui/material';

/**
 * Paper copies of a machine's record: only what was measured and found. The app bar, navigation,
 * buttons and entry forms and grids are left off; results, tables and charts stay, each kept
 * whole on a page where it fits. Anything marked `data-print="hide"` is left off too, and
 * `data-print="only"` shows on paper alone (the printed-on line).
 */
export function PrintStyles() {
  return (
    <GlobalStyles
      styles={{
        '[data-print="only"]': { display: 'none' },
        '@media print': {
          '@page': { margin: '14mm 12mm' },
          'html, body': { background: '#fff !important' },
          [[
            '.MuiAppBar-root',
            '.MuiDrawer-root',
            'nav',
            '.MuiSnackbar-root',
            '.MuiTabs-root',
            'button',
            '.MuiButton-root',
            '.MuiIconButton-root',
            'form',
            '[role="button"]:not(.MuiChip-root)',
            '.MuiFormControl-root',
            '.MuiFormControlLabel-root',
            '.MuiToggleButtonGroup-root',
            'input',
            'textarea',
            // An entry grid (its cells take indicator readings) and the box that holds it.
            '.MuiPaper-root:has([data-indicator-cell]):not(:has(figure))',
            'table:has([data-indicator-cell])',
            // Any grid typed into (travel-trial moves, backlash readings); a checkbox column alone keeps a table.
            'table:has(input:not([type="checkbox"]):not([type="radio"]))',
            '.MuiCheckbox-root',
            '.recharts-tooltip-wrapper',
            '[data-print="hide"]',
          ].join(', ')]: { display: 'none !important' },
          '[data-print="only"]': { display: 'block !important' },
          main: { padding: '0 !important' },
          // Charts were sized for the screen: on paper each scales to the page's width (their
          // drawing has a viewBox), the legend with it.
          '.recharts-responsive-container, .recharts-responsive-container > div, .recharts-wrapper': {
            width: '100% !important',
            height: 'auto !important',
          },
          '.recharts-wrapper > svg.recharts-surface': { width: '100% !important', height: 'auto !important' },
          '.recharts-legend-wrapper': { width: '100% !important', left: '0 !important' },
          a: { color: 'inherit !important', textDecoration: 'none !important' },
          'figure, table, tr, .MuiAlert-root': { breakInside: 'avoid' },
          '.MuiPaper-root': { breakInside: 'auto' },
        },
      }}
    />
  );
}
