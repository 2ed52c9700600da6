import { Table, TableBody, TableCell, TableHead, TableRow } from '@mui/material';
import { fromMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import type { PositioningTarget } from '../types';

const DECIMALS: Record<LengthUnit, number> = { mm: 4, um: 2, in: 5, thou: 3 };

/** Per-target values of a repeat-and-reverse run, in one unit named in the header. */
export function PositioningTargetsTable({ targets, unit }: { targets: PositioningTarget[]; unit: LengthUnit }) {
  const v = (mm: number) => fromMm(mm, unit).toFixed(DECIMALS[unit]);
  const u = UNIT_LABELS[unit];
  return (
    <Table size="small" aria-label="Values per target" sx={{ mt: 2 }}>
      <TableHead>
        <TableRow>
          <TableCell>Target (mm)</TableCell>
          <TableCell align="right">Mean up ({u})</TableCell>
          <TableCell align="right">Mean down ({u})</TableCell>
          <TableCell align="right">Reversal B ({u})</TableCell>
          <TableCell align="right">s up ({u})</TableCell>
          <TableCell align="right">s down ({u})</TableCell>
          <TableCell align="right">Repeatability R ({u})</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {targets.map((t) => (
          <TableRow key={t.target}>
            <TableCell>{t.target}</TableCell>
            <TableCell align="right">{v(t.meanUp)}</TableCell>
            <TableCell align="right">{v(t.meanDown)}</TableCell>
            <TableCell align="right">{v(t.reversal)}</TableCell>
            <TableCell align="right">{v(t.sUp)}</TableCell>
            <TableCell align="right">{v(t.sDown)}</TableCell>
            <TableCell align="right">{v(t.repeatability)}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
