import type { TargetValue } from '../database/schema/target-sets.js';
import { TARGET_KEYS, type TargetKey } from './target-keys.js';

// Starting values are common practice, not a standard; the owner edits them per workshop.
const CP = 'common practice';

export const PLASMA_DEFAULTS: Record<TargetKey, TargetValue> = {
  railStraightness: {
    value: 2,
    unit: 'thou',
    reference: 'minimum-zone',
    source: `${CP}: one to two thou over a rail's length for a carefully built plasma table; judged on the minimum zone (ISO 1101)`,
  },
  railParallelism: { value: 2, unit: 'thou', source: `${CP}: one to two thou between partner rails` },
  railHeightDifference: {
    value: 0.5,
    unit: 'um/mm',
    source: `${CP}: S = a × K with K twice one maker's catalogue figure (about 130 µm at 500 mm spacing for light preload, K ≈ 0.26 µm/mm); 0.25 mm at 500 mm`,
  },
  squareness: {
    value: 0.23,
    unit: 'mm/m',
    source: `${CP}: 0.5–1 mm diagonal difference over a sheet-sized test. Diagonals differ by about √2·δ for a skew δ, so the tighter 0.5 mm on a 1500 mm square (a sheet's width) is δ = 0.354 mm over 1.5 m: 0.236 mm/m, rounded down to 0.23`,
  },
  bedFlatness: {
    value: 0.03,
    unit: 'in',
    source: `${CP}: torch height over the cutting area within about 0.03 in; judged on the range of heights read from a gauge carried by the gantry, tilt left in`,
  },
  stepsPerMmError: { value: 0.1, unit: '%', source: `${CP}: 1 mm in a metre is visible on a sheet part` },
  reversal: { value: 0.1, unit: 'mm', source: `${CP}: backlash well under the kerf variation` },
  repeatability: { value: 0.1, unit: 'mm', source: CP },
  positioningAccuracy: {
    value: 0.3,
    unit: 'mm',
    source: `${CP}: rack drives are adequate for sheet cutting at 0.2–0.3 mm`,
  },
  screwSpeedHeadroom: {
    value: 10,
    unit: '%',
    source: `${CP}: keep the fastest feed at least 10 % below the permissible screw speed`,
  },
  travelMargin: { value: 25, unit: 'mm', source: `${CP}: room to pierce and lead in beyond the sheet edge` },
  partTolerance: {
    value: 0.9,
    unit: 'mm',
    source:
      'ISO 9013 class 2: ±0.9 mm on 35–125 mm parts in 3.15–6.3 mm plate. Each part is judged in its own size and plate-thickness band of the class 2 table (other bands from memory), scaled by this value ÷ 0.9',
  },
  recheckIntervalDays: { value: 180, unit: 'days', source: `${CP}: twice a year, and after any crash or move` },
};

export const ROUTER_DEFAULTS: Record<TargetKey, TargetValue> = {
  railStraightness: {
    value: 20,
    unit: 'um',
    reference: 'minimum-zone',
    source: `${CP}: finer than a plasma table; judged on the minimum zone (ISO 1101)`,
  },
  railParallelism: {
    value: 25,
    unit: 'um',
    source: "One rail maker's permissible parallelism for light preload, sizes 15/20",
  },
  railHeightDifference: {
    value: 0.26,
    unit: 'um/mm',
    source:
      "S = a × K, one maker's catalogue: about 130 µm at 500 mm rail spacing for light preload (K ≈ 0.26 µm per mm of spacing)",
  },
  squareness: {
    value: 0.14,
    unit: 'mm/m',
    source: `${CP}: 0.1–0.25 mm diagonal difference on a 500–1000 mm square. Diagonals differ by about √2·δ for a skew δ: 0.1 mm on 500 mm is 0.141 mm/m, 0.25 mm on 1000 mm is 0.177 mm/m; the tighter, rounded down, is 0.14`,
  },
  bedFlatness: {
    value: 0.1,
    unit: 'mm',
    source: `${CP}: spoilboard surfaced flat to about a tenth; judged on minimum-zone flatness (ISO 1101)`,
  },
  stepsPerMmError: { value: 0.05, unit: '%', source: CP },
  reversal: { value: 0.03, unit: 'mm', source: CP },
  repeatability: { value: 0.03, unit: 'mm', source: CP },
  positioningAccuracy: { value: 0.1, unit: 'mm', source: `${CP}: routers are judged in tenths of a millimetre` },
  screwSpeedHeadroom: {
    value: 10,
    unit: '%',
    source: `${CP}: keep the fastest feed at least 10 % below the permissible screw speed`,
  },
  travelMargin: { value: 10, unit: 'mm', source: `${CP}: room for the cutter radius and a clamp` },
  partTolerance: { value: 0.2, unit: 'mm', source: `${CP}: routers are judged in tenths of a millimetre` },
  recheckIntervalDays: { value: 90, unit: 'days', source: `${CP}: quarterly, and after any crash or move` },
};

export const DEFAULT_TARGET_SETS = [
  {
    name: 'Plasma table (default)',
    description: 'Starting tolerances for a carefully built plasma table; common practice, not a standard.',
    targets: PLASMA_DEFAULTS,
  },
  {
    name: 'Router (default)',
    description: 'Finer starting tolerances for a router or engraver; common practice, not a standard.',
    targets: ROUTER_DEFAULTS,
  },
];

/**
 * The product's default of each key, for a stored set that lacks it. A new key's migration gives
 * every stored set its default (see DEVELOPERS.md, "Adding a target key"), so this is only the
 * safety net: a set read without a key is judged against the default, never answered with a 500.
 */
export const FALLBACK_TARGETS: Record<TargetKey, TargetValue> = PLASMA_DEFAULTS;

const isTargetValue = (t: unknown): t is TargetValue =>
  !!t &&
  typeof t === 'object' &&
  typeof (t as TargetValue).value === 'number' &&
  Number.isFinite((t as TargetValue).value) &&
  typeof (t as TargetValue).unit === 'string';

/** A stored set's targets with every key there: a missing or unreadable one is the product's default. */
export function withDefaultTargets(
  stored: Record<string, TargetValue> | null | undefined,
): Record<string, TargetValue> & Record<TargetKey, TargetValue> {
  const out: Record<string, TargetValue> = { ...(stored ?? {}) };
  for (const key of TARGET_KEYS) if (!isTargetValue(out[key])) out[key] = FALLBACK_TARGETS[key];
  return out as Record<string, TargetValue> & Record<TargetKey, TargetValue>;
}
