import { fromMm, isLengthUnit, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import type { JudgedTarget } from '../types';

const DIGITS: Record<LengthUnit, number> = { mm: 3, um: 1, in: 4, thou: 2 };

export { isLengthUnit };

/** A length in mm shown in a unit, always with the unit. */
export const showLength = (mm: number | null | undefined, unit: LengthUnit = 'mm', digits?: number) =>
  mm === null || mm === undefined || !Number.isFinite(mm)
    ? '—'
    : `${fromMm(mm, unit).toFixed(digits ?? DIGITS[unit])} ${UNIT_LABELS[unit]}`;

/** Signed, for deviations and residuals: "+0.41 mm". */
export const showSigned = (mm: number, unit: LengthUnit = 'mm', digits?: number) => {
  const v = fromMm(mm, unit);
  const text = Math.abs(v).toFixed(digits ?? DIGITS[unit]);
  return `${v > 0 && Number(text) !== 0 ? '+' : v < 0 && Number(text) !== 0 ? '−' : ''}${text} ${UNIT_LABELS[unit]}`;
};

export const showTarget = (t: JudgedTarget) => `${t.value} ${isLengthUnit(t.unit) ? UNIT_LABELS[t.unit] : t.unit}`;

export { formatDateTime as showDate } from '../../../lib/format-time';
