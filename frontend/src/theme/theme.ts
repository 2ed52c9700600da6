import { createTheme } from '@mui/material/styles';

// Railwright's own look: deep verdigris steel with a brass accent on warm paper.
export const palette = {
  steel: '#1d4f4a',
  steelLight: '#3f7a73',
  steelDark: '#0f2f2c',
  brass: '#c8932a',
  paper: '#f6f4ef',
  ink: '#1e2624',
  within: '#2e7d4f',
  outside: '#b3261e',
  waived: '#7a5aa6',
  notStarted: '#6b7572',
};

// Phones and tablets are worked with a finger (often gloved, at the machine): below `md` every
// control offers at least a 44 × 44 px target (WCAG 2.5.5), whatever size it is drawn at.
export const TOUCH_TARGET = 44;
const base = createTheme();
const onTouch = base.breakpoints.down('md');
const touchTarget = { [onTouch]: { minHeight: TOUCH_TARGET, minWidth: TOUCH_TARGET } };

export const theme = createTheme({
  palette: {
    mode: 'light',
    primary: { main: palette.steel, light: palette.steelLight, dark: palette.steelDark, contrastText: '#ffffff' },
    secondary: { main: palette.brass, contrastText: '#1e1608' },
    success: { main: palette.within },
    error: { main: palette.outside },
    background: { default: palette.paper, paper: '#ffffff' },
    text: { primary: palette.ink, secondary: '#4d5855' },
  },
  shape: { borderRadius: 6 },
  typography: {
    fontFamily: 'Roboto, system-ui, sans-serif',
    h1: { fontSize: '2rem', fontWeight: 500, letterSpacing: '-0.01em' },
    h2: { fontSize: '1.6rem', fontWeight: 500 },
    h3: { fontSize: '1.3rem', fontWeight: 500 },
    h4: { fontSize: '1.1rem', fontWeight: 500 },
    h5: { fontSize: '1rem', fontWeight: 500 },
    h6: { fontSize: '0.95rem', fontWeight: 500 },
    button: { textTransform: 'none', fontWeight: 500 },
    overline: { letterSpacing: '0.12em', fontWeight: 500 },
  },
  components: {
    MuiAppBar: { defaultProps: { elevation: 0 } },
    MuiPaper: { defaultProps: { elevation: 0 }, styleOverrides: { root: { border: '1px solid #e2ded4' } } },
    MuiButton: { defaultProps: { disableElevation: true }, styleOverrides: { root: touchTarget } },
    MuiIconButton: { styleOverrides: { root: touchTarget } },
    MuiToggleButton: { styleOverrides: { root: touchTarget } },
    MuiTab: { styleOverrides: { root: { minHeight: 48 } } },
    MuiListItemButton: { styleOverrides: { root: { [onTouch]: { minHeight: TOUCH_TARGET } } } },
    MuiMenuItem: { styleOverrides: { root: { [onTouch]: { minHeight: TOUCH_TARGET } } } },
    MuiCheckbox: { styleOverrides: { root: { [onTouch]: { padding: 10 } } } },
    MuiRadio: { styleOverrides: { root: { [onTouch]: { padding: 10 } } } },
    MuiSwitch: { styleOverrides: { switchBase: { [onTouch]: { padding: 12 } } } },
    MuiInputBase: { styleOverrides: { root: { [onTouch]: { minHeight: TOUCH_TARGET } } } },
    MuiChip: {
      styleOverrides: {
        clickable: { [onTouch]: { height: TOUCH_TARGET, minWidth: TOUCH_TARGET, borderRadius: TOUCH_TARGET / 2 } },
      },
    },
    MuiTableSortLabel: { styleOverrides: { root: { [onTouch]: { minHeight: TOUCH_TARGET } } } },
    // Breadcrumb links stand alone, so they get the full target too.
    MuiBreadcrumbs: {
      styleOverrides: {
        li: { [onTouch]: { '& > a': { display: 'inline-flex', alignItems: 'center', minHeight: TOUCH_TARGET } } },
      },
    },
    // A summary's text may be long (a mail's subject): it wraps or ends in an ellipsis, never widens the page.
    MuiAccordionSummary: { styleOverrides: { content: { minWidth: 0 } } },
    MuiTextField: { defaultProps: { size: 'small' } },
    MuiTableCell: {
      styleOverrides: {
        head: { fontWeight: 600, color: '#4d5855' },
        // A small table takes the padding off its checkboxes; a finger needs it back.
        paddingCheckbox: { [onTouch]: { '& > .MuiCheckbox-root': { padding: 10 } } },
      },
    },
  },
});
