import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';

// A dial reads to 0.5 thou or 0.01 mm; one more decimal than that is plenty at the machine.
const DECIMALS: Record<LengthUnit, number> = { mm: 3, um: 1, in: 4, thou: 1 };

/** "+0.5 thou", "−0.012 mm", "0.0 thou": a value already in `unit`, with its sign and unit. */
export function signed(value: number | null | undefined, unit: LengthUnit): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const text = Math.abs(value).toFixed(DECIMALS[unit]);
  const zero = Number(text) === 0;
  return `${zero ? '' : value > 0 ? '+' : '−'}${text} ${UNIT_LABELS[unit]}`;
}

export function plain(value: number, unit: LengthUnit): string {
  return `${value.toFixed(DECIMALS[unit])} ${UNIT_LABELS[unit]}`;
}

/** Reads what was typed: a comma works as the decimal point; empty or junk is null. */
export function parseReading(text: string): number | null {
  const t = text.trim().replace(',', '.').replace('−', '-');
  if (!/^[+-]?(\d+\.?\d*|\.\d+)$/.test(t)) return null;
  return Number(t);
}

export const holeName = (index: number) => `Hole ${index + 1}`;
