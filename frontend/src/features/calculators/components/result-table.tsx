import type { ReactNode } from 'react';
import { Table, TableBody, TableCell, TableRow, Typography } from '@mui/material';

export interface ResultRow {
  label: string;
  value: ReactNode;
  /** A short line under the label: what the number means. */
  note?: string;
  strong?: boolean;
}

export function ResultTable({ title, rows }: { title: string; rows: ResultRow[] }) {
  return (
    <Table size="small" aria-label={title}>
      <TableBody>
        {rows.map((r) => (
          <TableRow key={r.label}>
            <TableCell component="th" scope="row" sx={{ pl: 0, verticalAlign: 'top' }}>
              <Typography variant="body2" sx={{ fontWeight: r.strong ? 600 : 400 }}>
                {r.label}
              </Typography>
              {r.note && (
                <Typography variant="caption" color="text.secondary">
                  {r.note}
                </Typography>
              )}
            </TableCell>
            <TableCell
              align="right"
              sx={{
                pr: 0,
                verticalAlign: 'top',
                fontVariantNumeric: 'tabular-nums',
                fontWeight: r.strong ? 600 : 400,
                whiteSpace: 'nowrap',
              }}
            >
              {r.value}
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
