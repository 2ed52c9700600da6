import { fromMm, isLengthUnit, toMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import type { TargetValue } from '../types';

const DIGITS: Record<LengthUnit, number> = { mm: 4, um: 1, in: 5, thou: 2 };

/** A length in mm shown in a unit, always with the unit. */
export const showLength = (mm: number | null | undefined, unit: LengthUnit) =>
  mm === null || mm === undefined || !Number.isFinite(mm)
    ? '—'
    : `${fromMm(mm, unit).toFixed(DIGITS[unit])} ${UNIT_LABELS[unit]}`;

export { isLengthUnit };

export const showTarget = (t: TargetValue) => `${t.value} ${isLengthUnit(t.unit) ? UNIT_LABELS[t.unit] : t.unit}`;

/** A result in mm shown in the target's unit (the way the target was written). */
export const showInTargetUnit = (mm: number, t: TargetValue) => showLength(mm, isLengthUnit(t.unit) ? t.unit : 'mm');

export const targetMm = (t: TargetValue) => (isLengthUnit(t.unit) ? toMm(t.value, t.unit) : t.value);
