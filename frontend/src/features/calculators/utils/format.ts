import { fromMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';

/** Decimals that show the resolution people work to in each unit. */
const LENGTH_DECIMALS: Record<LengthUnit, number> = { mm: 4, um: 2, in: 5, thou: 3 };

export function lengthIn(mm: number, unit: LengthUnit): string {
  if (!Number.isFinite(mm)) return '—';
  return `${fromMm(mm, unit).toFixed(LENGTH_DECIMALS[unit])} ${UNIT_LABELS[unit]}`;
}

/** A slope in mm/mm shown as the unit per metre (µm/m, thou/m…). */
export function slopePerMetre(slope: number, unit: LengthUnit): string {
  if (!Number.isFinite(slope)) return '—';
  return `${fromMm(slope * 1000, unit).toFixed(LENGTH_DECIMALS[unit])} ${UNIT_LABELS[unit]}/m`;
}

export function fixed(value: number, decimals: number, unit?: string): string {
  if (!Number.isFinite(value)) return '—';
  const text = value.toLocaleString('en-GB', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
  return unit ? `${text} ${unit}` : text;
}

/** Significant figures for values that span magnitudes (steps per mm, scale). */
export function significant(value: number, digits = 6, unit?: string): string {
  if (!Number.isFinite(value)) return '—';
  const text = Number(value.toPrecision(digits)).toString();
  return unit ? `${text} ${unit}` : text;
}
