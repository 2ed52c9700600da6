import { EngineInputError } from './engine-input-error.js';

/** Units a user may pick for readings; the engine itself works in millimetres only. */
export const LENGTH_UNITS = ['mm', 'um', 'in', 'thou'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

/** Millimetres in one unit. 1 in = 25.4 mm exactly (international inch of 1959); thou = 0.001 in. */
export const MM_PER_UNIT: Readonly<Record<LengthUnit, number>> = {
  mm: 1,
  um: 0.001,
  in: 25.4,
  thou: 0.0254,
};

export function isLengthUnit(value: unknown): value is LengthUnit {
  return typeof value === 'string' && (LENGTH_UNITS as readonly string[]).includes(value);
}

/** Reads an optional unit field; absent means millimetres. */
export function parseLengthUnit(value: unknown, field = 'unit'): LengthUnit {
  if (value === undefined || value === null) return 'mm';
  if (!isLengthUnit(value)) {
    throw new EngineInputError(
      `${field} must be one of ${LENGTH_UNITS.join(', ')} (got ${JSON.stringify(value)})`,
      field,
    );
  }
  return value;
}

// Scaling by integers and dividing last gives the correctly rounded mm value for the decimals
// people type (3 µm · 0.001 is not 0.003 in binary, 3 / 1000 is; 12 in · 25.4 is not 304.8,
// 12 · 254 / 10 is).
export function toMm(value: number, unit: LengthUnit): number {
  switch (unit) {
    case 'mm':
      return value;
    case 'um':
      return value / 1000;
    case 'in':
      return (value * 254) / 10;
    case 'thou':
      return (value * 254) / 10000;
  }
}

export function fromMm(valueMm: number, unit: LengthUnit): number {
  switch (unit) {
    case 'mm':
      return valueMm;
    case 'um':
      return valueMm * 1000;
    case 'in':
      return (valueMm * 10) / 254;
    case 'thou':
      return (valueMm * 10000) / 254;
  }
}

/**
 * The values in mm. Already in mm, the same list comes back (no copy: a 200 000-value list costs
 * several milliseconds and megabytes to copy, and nothing that reads it changes it).
 */
export function arrayToMm(values: readonly number[], unit: LengthUnit): number[] {
  if (unit === 'mm') return values as number[];
  const out = new Array<number>(values.length);
  for (let i = 0; i < values.length; i++) out[i] = toMm(values[i], unit);
  return out;
}

export function arrayFromMm(valuesMm: readonly number[], unit: LengthUnit): number[] {
  if (unit === 'mm') return valuesMm.slice();
  const out = new Array<number>(valuesMm.length);
  for (let i = 0; i < valuesMm.length; i++) out[i] = fromMm(valuesMm[i], unit);
  return out;
}
