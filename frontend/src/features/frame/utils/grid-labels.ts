import { fromMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import type { GridPointResult } from '../types';

/** "+0.41 mm", "−3.2 thou". */
export function residualOf(mm: number, unit: LengthUnit, digits: number): string {
  const v = fromMm(mm, unit);
  const text = Math.abs(v).toFixed(digits);
  const sign = Number(text) === 0 ? '' : v > 0 ? '+' : '−';
  return `${sign}${text} ${UNIT_LABELS[unit]}`;
}

/** "row 2, column 3: +0.41 mm" (the least-squares residual, or the value given). */
export const namePoint = (p: GridPointResult, unit: LengthUnit, digits: number, valueMm = p.residualMm) =>
  `row ${p.row}, column ${p.column}: ${residualOf(valueMm, unit, digits)}`;

/** Positions spread evenly from 0 to the length, rounded to whole mm. */
export const evenPositions = (count: number, lengthMm: number) =>
  Array.from({ length: count }, (_, i) => (count === 1 ? 0 : Math.round((lengthMm * i) / (count - 1))));
