import { useCallback, useRef } from 'react';
import { Table, TableBody, TableCell, TableContainer, TableHead, TableRow } from '@mui/material';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import type { StationDraft } from '../hooks/use-sweep-draft';
import { StationRow } from './station-row';

/**
 * One reading field per station, made for a hand that holds an indicator: Enter moves to the next
 * station's reading (and from the last one to Save).
 */
export function StationReadings({
  rows,
  unit,
  lengthUnit = 'mm',
  problems,
  residuals,
  onRowChange,
  onDrop,
  onLastEnter,
}: {
  rows: StationDraft[];
  unit: LengthUnit;
  /** Unit the positions are typed in. */
  lengthUnit?: LengthUnit;
  problems: Map<number, string>;
  /** Residual from the live fit per row, in the unit, when known. */
  residuals?: (number | null)[];
  /** These three should keep their identity between renders (useCallback), so rows stay memoised. */
  onRowChange: (index: number, patch: Partial<StationDraft>) => void;
  onDrop: (index: number) => void;
  onLastEnter: () => void;
}) {
  const inputs = useRef<(HTMLInputElement | null)[]>([]);
  const inputRef = useCallback((i: number, el: HTMLInputElement | null) => {
    inputs.current[i] = el;
  }, []);
  const next = useCallback(
    (i: number) => {
      const el = inputs.current[i + 1];
      if (el) {
        el.focus();
        el.select();
      } else onLastEnter();
    },
    [onLastEnter],
  );
  return (
    <TableContainer sx={{ maxHeight: 520 }}>
      <Table size="small" stickyHeader aria-label="Stations and readings" sx={{ '& td, & th': { px: { xs: 0.5, sm: 1 } } }}>
        <TableHead>
          <TableRow>
            <TableCell sx={{ width: { xs: 24, sm: 40 } }}>#</TableCell>
            <TableCell sx={{ width: { xs: 72, sm: 100 } }}>Station ({UNIT_LABELS[lengthUnit]})</TableCell>
            <TableCell>Reading ({UNIT_LABELS[unit]})</TableCell>
            <TableCell align="right" sx={{ width: { xs: 56, sm: 80 } }}>
              Residual
            </TableCell>
            <TableCell sx={{ width: 40 }} />
          </TableRow>
        </TableHead>
        <TableBody>
          {rows.map((r, i) => (
            <StationRow
              key={i}
              index={i}
              row={r}
              unit={unit}
              problem={problems.get(i)}
              residual={residuals?.[i]}
              onRowChange={onRowChange}
              onEnter={next}
              onDrop={onDrop}
              inputRef={inputRef}
            />
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
