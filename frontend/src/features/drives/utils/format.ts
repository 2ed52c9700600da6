import { fromMm, isLengthUnit, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import type { TargetValue } from '../types';

const DIGITS: Record<LengthUnit, number> = { mm: 3, um: 1, in: 4, thou: 2 };

export { isLengthUnit };

/** A length held in mm, shown in a unit with the unit beside it. */
export function showLength(mm: number | null | undefined, unit: LengthUnit, digits = DIGITS[unit]): string {
  if (mm === null || mm === undefined || !Number.isFinite(mm)) return '—';
  return `${fromMm(mm, unit).toFixed(digits)} ${UNIT_LABELS[unit]}`;
}

export const showTarget = (t: TargetValue) => `${t.value} ${isLengthUnit(t.unit) ? UNIT_LABELS[t.unit] : t.unit}`;

/** Steps per mm as a controller takes it. */
export const showSteps = (v: number) => `${Number(v.toFixed(4))} steps/mm`;

export const showRpm = (v: number | null) => (v === null ? '—' : `${Math.round(v).toLocaleString('en-GB')} rpm`);

/** A feed rate in a length unit per minute: whole mm, inches to two decimals. */
export const showFeed = (v: number | null, unit: LengthUnit = 'mm') =>
  v === null ? '—' : `${unit === 'in' ? v.toFixed(2) : Math.round(v).toLocaleString('en-GB')} ${UNIT_LABELS[unit]}/min`;

/** Steps per inch (steps per mm × 25.4). */
export const showStepsPerInch = (stepsPerInch: number) => `${Number(stepsPerInch.toFixed(3))} steps/in`;

export const showPercent = (v: number, digits = 3) => `${v >= 0 ? '+' : ''}${v.toFixed(digits)} %`;

export { formatDate as showDate } from '../../../lib/format-time';

export const showDateTime = (iso: string) =>
  new Date(iso).toLocaleString('en-GB', {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
  });

/** Every message of a refused request (the server names each field at fault). */
export function errorText(e: unknown): string {
  const details = (e as { details?: unknown }).details;
  if (Array.isArray(details) && details.length) return details.join('; ');
  return e instanceof Error ? e.message : String(e);
}
