import { isLengthUnit, LENGTH_UNITS, UNIT_LABELS, type LengthUnit } from '../../lib/units';

export type TargetUnit = LengthUnit | 'mm/m' | '%' | 'days' | 'um/mm';
export type StraightnessReference = 'minimum-zone' | 'least-squares';
export const REFERENCE_WORDS: Record<StraightnessReference, string> = { 'minimum-zone': 'minimum zone (ISO 1101)', 'least-squares': 'least squares line' };

export interface Target {
  value: number;
  unit: TargetUnit;
  source?: string;
  /** Read on the rail straightness target: the line it is judged from (minimum zone when absent). */
  reference?: StraightnessReference;
  label: string;
}

export interface TargetSet {
  id: string;
  name: string;
  description: string;
  targets: Record<string, Target>;
  updatedAt: string;
  /** Machines judged against this set; `approved` ones keep the values they were signed with. */
  usedBy: { id: string; name: string; state: string; approved: boolean }[];
}

export const UNIT_WORDS: Record<TargetUnit, string> = { ...UNIT_LABELS, 'mm/m': 'mm/m', '%': '%', days: 'days', 'um/mm': 'µm per mm of rail spacing' };

/** Which units a target may be given in: lengths in any length unit, others as they are. */
export const unitChoices = (unit: TargetUnit): TargetUnit[] => (isLengthUnit(unit) ? LENGTH_UNITS : [unit]);

export const targetSetKeys = {
  all: ['target-sets'] as const,
  list: () => [...targetSetKeys.all, 'list'] as const,
};
