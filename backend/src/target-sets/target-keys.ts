import type { TargetValue } from '../database/schema/target-sets.js';

/** Every tolerance a target set holds; each check is judged against one of these. */
export const TARGET_KEYS = [
  'railStraightness',
  'railParallelism',
  'railHeightDifference',
  'squareness',
  'bedFlatness',
  'stepsPerMmError',
  'reversal',
  'repeatability',
  'positioningAccuracy',
  'screwSpeedHeadroom',
  'travelMargin',
  'partTolerance',
  'recheckIntervalDays',
] as const;
export type TargetKey = (typeof TARGET_KEYS)[number];

export const TARGET_LABELS: Record<TargetKey, string> = {
  railStraightness: 'Rail straightness (over the rail length)',
  railParallelism: 'Rail parallelism (partner rails)',
  railHeightDifference: 'Height difference between partner rails (S = a × K, a the rail spacing)',
  squareness: 'Gantry squareness',
  bedFlatness: 'Bed flatness',
  stepsPerMmError: 'Steps-per-mm error',
  reversal: 'Reversal value (backlash)',
  repeatability: 'Repeatability (bidirectional)',
  positioningAccuracy: 'Positioning accuracy',
  screwSpeedHeadroom: 'Screw speed headroom below the permissible speed',
  travelMargin: 'Travel margin beyond the work area (each axis)',
  partTolerance: 'Test-cut part size tolerance (±)',
  recheckIntervalDays: 'Re-check interval',
};

/** Which kind of unit each target may be stored in. */
export const TARGET_UNIT_KIND: Record<TargetKey, 'length' | 'mm/m' | '%' | 'days' | 'per-spacing'> = {
  railStraightness: 'length',
  railParallelism: 'length',
  railHeightDifference: 'per-spacing',
  squareness: 'mm/m',
  bedFlatness: 'length',
  stepsPerMmError: '%',
  reversal: 'length',
  repeatability: 'length',
  positioningAccuracy: 'length',
  screwSpeedHeadroom: '%',
  travelMargin: 'length',
  partTolerance: 'length',
  recheckIntervalDays: 'days',
};

const MM_PER: Record<string, number> = { mm: 1, um: 0.001, in: 25.4, thou: 0.0254 };

/** A length target in mm (for comparing with results, which are mm); other targets as stored. */
export function targetInBaseUnit(t: TargetValue): number {
  return t.value * (MM_PER[t.unit] ?? 1);
}
