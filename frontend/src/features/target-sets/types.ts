import type { Schemas } from '../../lib/api/schemas';
import { isLengthUnit, LENGTH_UNITS, UNIT_LABELS } from '../../lib/units';

export type TargetSet = Schemas['TargetSetResponse'];
export type TargetKey = keyof TargetSet['targets'];
/** One target of a set, with its label; `reference` only on the rail straightness target (minimum zone when absent). */
export type Target = TargetSet['targets'][TargetKey];
export type TargetUnit = Target['unit'];
export type StraightnessReference = NonNullable<Target['reference']>;
export const REFERENCE_WORDS: Record<StraightnessReference, string> = {
  'minimum-zone': 'minimum zone (ISO 1101)',
  'least-squares': 'least squares line',
};

export const UNIT_WORDS: Record<TargetUnit, string> = {
  ...UNIT_LABELS,
  'mm/m': 'mm/m',
  '%': '%',
  days: 'days',
  'um/mm': 'µm per mm of rail spacing',
};

/** Which units a target may be given in: lengths in any length unit, others as they are. */
export const unitChoices = (unit: TargetUnit): TargetUnit[] => (isLengthUnit(unit) ? LENGTH_UNITS : [unit]);

export const targetSetKeys = {
  all: ['target-sets'] as const,
  list: () => [...targetSetKeys.all, 'list'] as const,
};
