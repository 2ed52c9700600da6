import { memo, useCallback, useMemo, useRef } from 'react';
import { Table, TableBody, TableCell, TableContainer, TableHead, TableRow } from '@mui/material';
import { fromMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { useDraft, type StationDraft, type SweepDraftStore } from '../hooks/use-sweep-draft';
import type { PreviewBody } from '../api/preview-straightness';
import type { StraightnessResult } from '../types';
import { StationRow } from './station-row';

/**
 * One reading field per station, made for a hand that holds an indicator: Enter moves to the next
 * station's reading (and from the last one to Save).
 */
export const StationReadings = memo(function StationReadings({
  store,
  unit,
  lengthUnit = 'mm',
  fit,
  onRowChange,
  onDrop,
  onLastEnter,
}: {
  store: SweepDraftStore;
  unit: LengthUnit;
  /** Unit the positions are typed in. */
  lengthUnit?: LengthUnit;
  /** The live fit, whose residuals are shown beside the readings they belong to. */
  fit: { body: PreviewBody; result: StraightnessResult } | undefined;
  /** These three should keep their identity between renders (useCallback), so rows stay memoised. */
  onRowChange: (index: number, patch: Partial<StationDraft>) => void;
  onDrop: (index: number) => void;
  onLastEnter: () => void;
}) {
  // Only the number of stations is read here: each row reads its own station, so a keystroke
  // re-renders neither this table nor the other rows.
  const count = useDraft(store, (d) => d.stations.length);
  // Residuals back onto the rows they belong to (rows without a reading have none).
  const residuals = useMemo(
    () =>
      fit ? new Map(fit.body.positions.map((p, k) => [p, fromMm(fit.result.leastSquares.residuals[k], unit)])) : null,
    [fit, unit],
  );
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
      <Table
        size="small"
        stickyHeader
        aria-label="Stations and readings"
        sx={{ '& td, & th': { px: { xs: 0.5, sm: 1 } } }}
      >
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
          {Array.from({ length: count }, (_, i) => (
            <StationRow
              key={i}
              store={store}
              index={i}
              unit={unit}
              residuals={residuals}
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
});
