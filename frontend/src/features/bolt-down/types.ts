import type { LengthUnit } from '../../lib/units';

export type BoltDownMode = 'face' | 'line';

export interface BoltDownHole {
  index: number;
  /** Hole centre from the rail's start, mm. */
  position: number;
  /** Rank in the proposed fixing order (0 = first). */
  order: number;
  /** Aim and reading in the bolt-down's unit. */
  target: number | null;
  targetMm: number | null;
  reading: number | null;
  readingMm: number | null;
  difference: number | null;
  onTarget: boolean | null;
  fixed: boolean;
  fixedAt: string | null;
  fixedBy: string | null;
}

export interface BoltDown {
  id: string;
  railId: string;
  machineId: string;
  rail: { label: string; axis: string; lengthMm: number };
  mode: BoltDownMode;
  /** Readings, aims and the band are in readingUnit; hole `at` in lengthUnit (`position` in mm). */
  readingUnit: LengthUnit;
  lengthUnit: LengthUnit;
  band: number;
  bandMm: number;
  holes: BoltDownHole[];
  nextHole: number | null;
  fixedCount: number;
  holeCount: number;
  complete: boolean;
  finalSweepId: string | null;
  /** Set when the bolt-down was given up: when, by whom and why. */
  abandoned: { at: string; by: string | null; reason: string } | null;
  createdBy: string;
  createdAt: string;
  updatedAt: string;
}

export interface HoleWriteResult extends BoltDown {
  writeId: string;
  repeated: boolean;
}

/** The parts of the rail the guide needs before a bolt-down exists. */
export interface RailSummary {
  id: string;
  machineId: string;
  label: string;
  axis: string;
  lengthMm: number;
  profileSize: number | null;
  holes: { index: number; position: number }[];
  typicalBoltSize: string | null;
}

export interface FinalSweepResult {
  boltDown: BoltDown;
  sweep: {
    id: string;
    readingUnit: LengthUnit;
    stations: { position: number; reading: number; readingMm: number }[];
    status: 'within-target' | 'outside-target';
    target: { value: number; unit: string };
    result: {
      leastSquares: { slope: number; intercept: number; straightness: number };
      minimumZone: { slope: number; intercept: number; straightness: number };
    };
  };
}

export const MODE_LABELS: Record<BoltDownMode, string> = { face: 'Face mode', line: 'Line mode' };

/** One sentence per mode, shown beside the guide. */
export const MODE_EXPLAINED: Record<BoltDownMode, string> = {
  face: "The indicator rides on a carriage against the frame's reference face, so every hole is brought to the reading of the first hole fixed.",
  line: 'Each hole is aimed at the straight line between the nearest fixed holes on either side, so the rail is laid straight between holes already tight.',
};

export const boltDownKeys = {
  all: ['bolt-downs'] as const,
  forRail: (railId: string) => [...boltDownKeys.all, 'rail', railId] as const,
  detail: (id: string) => [...boltDownKeys.all, 'detail', id] as const,
  rail: (railId: string) => [...boltDownKeys.all, 'rail-summary', railId] as const,
  boltTorques: () => [...boltDownKeys.all, 'bolt-torques'] as const,
};
