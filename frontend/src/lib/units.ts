import type { Schemas } from './api/schemas';

/**
 * Length units the user may pick for entry and display, as the server's description lists them
 * (both unit families take the same list); lengths are mm inside.
 */
export type LengthUnit = NonNullable<Schemas['StraightnessDto']['lengthUnit']>;

export const UNIT_LABELS: Record<LengthUnit, string> = { mm: 'mm', um: 'µm', in: 'in', thou: 'thou' };

// 1 in = 25.4 mm exactly.
export const MM_PER_UNIT: Record<LengthUnit, number> = { mm: 1, um: 0.001, in: 25.4, thou: 0.0254 };

/** Every length unit, in the order they are offered (the keys above, which the compiler holds to the description's list). */
export const LENGTH_UNITS = Object.keys(MM_PER_UNIT) as LengthUnit[];

export const isLengthUnit = (u: string): u is LengthUnit => Object.hasOwn(MM_PER_UNIT, u);

export const toMm = (value: number, unit: LengthUnit) => value * MM_PER_UNIT[unit];
export const fromMm = (mm: number, unit: LengthUnit) => mm / MM_PER_UNIT[unit];

const DECIMALS: Record<LengthUnit, number> = { mm: 3, um: 1, in: 4, thou: 2 };

/** "0.025 mm", "1.0 thou": always with its unit. */
export function formatLength(mm: number | null | undefined, unit: LengthUnit = 'mm', decimals?: number): string {
  if (mm === null || mm === undefined || !Number.isFinite(mm)) return '—';
  return `${fromMm(mm, unit).toFixed(decimals ?? DECIMALS[unit])} ${UNIT_LABELS[unit]}`;
}
