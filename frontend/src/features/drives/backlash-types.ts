import type { LengthUnit } from '../../lib/units';
import { driveKeys, type TargetValue } from './types';

/** A warning that travels with a result: a stable code and one plain sentence. */
export interface ResultWarning {
  code: string;
  message: string;
}

export interface BacklashPosition {
  position: number;
  up: number[];
  down: number[];
}

/** A backlash check as the server answers it: entries as typed, results in their units and in mm. */
export interface BacklashCheck {
  id: string;
  axisId: string;
  machineId: string;
  lengthUnit: LengthUnit;
  readingUnit: LengthUnit;
  positions: BacklashPosition[];
  resolution: number | null;
  definition: string;
  result: {
    backlash: number;
    backlashMm: number;
    worstPosition: number;
    worstPositionMm: number;
    meanBacklash: number;
    meanBacklashMm: number;
    positions: { position: number; positionMm: number; meanUp: number; meanDown: number; reversal: number; backlash: number; backlashMm: number; approachesUp: number; approachesDown: number }[];
  } | null;
  unreadable?: string;
  status: 'within-target' | 'outside-target';
  warnings: ResultWarning[];
  target: TargetValue & { valueMm: number };
  notes: string;
  recordedBy: string;
  recordedAt: string;
  locked: boolean;
}

export const backlashKeys = {
  list: (axisId: string) => [...driveKeys.all, 'axis', axisId, 'backlash'] as const,
};
