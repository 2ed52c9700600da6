/** Length units the user may pick for entry and display; lengths are mm inside. */
export type LengthUnit = 'mm' | 'um' | 'in' | 'thou';

export const UNIT_LABELS: Record<LengthUnit, string> = { mm: 'mm', um: 'µm', in: 'in', thou: 'thou' };

// 1 in = 25.4 mm exactly.
export const MM_PER_UNIT: Record<LengthUnit, number> = { mm: 1, um: 0.001, in: 25.4, thou: 0.0254 };

export const toMm = (value: number, unit: LengthUnit) => value * MM_PER_UNIT[unit];
export const fromMm = (mm: number, unit: LengthUnit) => mm / MM_PER_UNIT[unit];

const DECIMALS: Record<LengthUnit, number> = { mm: 3, um: 1, in: 4, thou: 2 };

/** "0.025 mm", "1.0 thou": always with its unit. */
export function formatLength(mm: number | null | undefined, unit: LengthUnit = 'mm', decimals?: number): string {
  if (mm === null || mm === undefined || !Number.isFinite(mm)) return '—';
  return `${fromMm(mm, unit).toFixed(decimals ?? DECIMALS[unit])} ${UNIT_LABELS[unit]}`;
}
