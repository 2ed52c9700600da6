import { useLayoutEffect, useRef, type ReactNode } from 'react';
import { TableContainer, type SxProps, type Theme } from '@mui/material';
import { copyHeaderLabels } from './copy-header-labels';

export interface ResponsiveTableProps {
  /** One MUI `<Table>` with a `<TableHead>` whose cells name the columns. */
  children: ReactNode;
  /** The first cell of each row becomes the card's title on a phone (a name, a date). */
  titleFirst?: boolean;
  component?: React.ElementType;
  sx?: SxProps<Theme>;
}

/**
 * A normal table from `sm` up; below it each row is a card of label–value lines, the labels
 * taken from the table's own header, so a phone never scrolls sideways nor wraps a word a line.
 * Wrap any read-only table in it in place of `TableContainer`; entry grids stay grids.
 */
export function ResponsiveTable({ children, titleFirst = true, component, sx }: ResponsiveTableProps) {
  const ref = useRef<HTMLDivElement>(null);
  useLayoutEffect(() => {
    const root = ref.current;
    if (!root) return;
    copyHeaderLabels(root);
    // Rows come and go with the data; label the new cells as they appear.
    const observer = new MutationObserver(() => copyHeaderLabels(root));
    observer.observe(root, { childList: true, subtree: true, characterData: true });
    return () => observer.disconnect();
  }, []);
  return (
    <TableContainer
      ref={ref}
      component={component ?? 'div'}
      data-responsive-table=""
      sx={[stackedOnPhone(titleFirst), ...(Array.isArray(sx) ? sx : [sx])]}
    >
      {children}
    </TableContainer>
  );
}

const stackedOnPhone = (titleFirst: boolean) => (theme: Theme) => ({
  // A link in a cell (a rail's or an axis's name) is a finger's target on phones and tablets.
  [theme.breakpoints.down('md')]: {
    '& tbody td a:not(.MuiButtonBase-root)': {
      display: 'inline-flex',
      alignItems: 'center',
      minHeight: 44,
      minWidth: 44,
    },
  },
  [theme.breakpoints.down('sm')]: {
    overflowX: 'visible',
    '& table, & tbody, & tr, & td': { display: 'block', width: '100%', boxSizing: 'border-box' },
    '& table': { minWidth: 0 },
    // The header is read from each cell's label; keep it for screen readers only.
    '& thead': {
      display: 'block',
      position: 'absolute',
      width: '1px',
      height: '1px',
      overflow: 'hidden',
      clip: 'rect(0 0 0 0)',
      whiteSpace: 'nowrap',
    },
    '& tbody tr': {
      border: `1px solid ${theme.palette.divider}`,
      borderRadius: `${theme.shape.borderRadius}px`,
      backgroundColor: theme.palette.background.paper,
      padding: theme.spacing(1, 1.5),
      marginBottom: theme.spacing(1),
      height: 'auto',
    },
    // Label in a left column, the value (however many lines) beside it.
    '& tbody td': {
      display: 'block',
      position: 'relative',
      border: 0,
      padding: theme.spacing(0.5, 0, 0.5, 0),
      paddingLeft: '40%',
      textAlign: 'left',
      whiteSpace: 'normal',
      overflowWrap: 'anywhere',
      minWidth: 0,
      maxWidth: 'none',
    },
    '& tbody td[data-label]::before': {
      content: 'attr(data-label)',
      position: 'absolute',
      left: 0,
      width: 'calc(40% - 12px)',
      fontWeight: 600,
      color: theme.palette.text.secondary,
      overflowWrap: 'break-word',
    },
    '& tbody td:not([data-label])': { paddingLeft: 0 },
    '& tbody td:empty': { display: 'none' },
    ...(titleFirst && {
      '& tbody td:first-of-type': { paddingLeft: 0, fontWeight: 600, fontSize: '1rem' },
      '& tbody td:first-of-type::before': { display: 'none' },
    }),
  },
});
