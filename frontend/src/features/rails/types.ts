import type { LengthUnit } from '../../lib/units';

export type SweepPhase = 'as-found' | 'as-left';
export type SweepStatus = 'within-target' | 'outside-target';
export type CheckState = SweepStatus | 'not-comparable' | 'not-started';

export interface TargetValue {
  value: number;
  unit: string;
}

export interface Rail {
  id: string;
  machineId: string;
  label: string;
  axis: string;
  lengthMm: number;
  profileSize: number | null;
  holePitchMm: number;
  firstHoleMm: number;
  partnerRailId: string | null;
  holes: { index: number; position: number }[];
  typicalBoltSize: string | null;
  createdAt: string;
  updatedAt: string;
  /** Present when the stored length, pitch or first hole cannot be read (holes is then empty). */
  unreadable?: string;
}

export interface SweepSummary {
  id: string;
  takenAt: string;
  phase: SweepPhase;
  datum: string | null;
  /** null when the stored result cannot be read (then `unreadable` says so). */
  leastSquaresStraightness: number | null;
  minimumZoneStraightness: number | null;
  status: SweepStatus;
  target: TargetValue;
  unreadable?: string;
}

export interface RailListItem extends Rail {
  sweepCount: number;
  latestSweep: SweepSummary | null;
}

export interface FitLine {
  slope: number;
  intercept: number;
  straightness: number;
  residuals: number[];
}

export interface StraightnessResult {
  leastSquares: FitLine;
  minimumZone: FitLine;
  endPoint: FitLine;
}

export interface Sweep {
  id: string;
  railId: string;
  machineId: string;
  unit: LengthUnit;
  /** null (with `unreadable`) when the stored readings cannot be read. */
  stations: { position: number; reading: number; readingMm: number }[] | null;
  instrument: string;
  resolution: number | null;
  temperatureC: number | null;
  phase: SweepPhase;
  takenBy: string;
  boltSize: string | null;
  torqueNm: number | null;
  datum: string | null;
  notes: string;
  /** null (with `unreadable`) when the stored result cannot be read. */
  result: StraightnessResult | null;
  status: SweepStatus;
  target: TargetValue;
  unreadable?: string;
  takenAt: string;
  createdAt: string;
  locked: boolean;
}

export interface NewSweep {
  id: string;
  unit: LengthUnit;
  stations: { position: number; reading: number }[];
  instrument?: string;
  resolution?: number;
  temperatureC?: number;
  phase: SweepPhase;
  takenBy?: string;
  boltSize?: string;
  torqueNm?: number;
  datum?: string;
  notes?: string;
}

export interface Parallelism {
  railId: string;
  partnerRailId: string | null;
  status: SweepStatus | 'not-comparable';
  reason?: string;
  datum?: string;
  parallelism?: number;
  meanOffset?: number;
  positions?: number[];
  differences?: number[];
  parallelismWithin?: boolean;
  heightDifferenceWithin?: boolean;
  targets: { parallelism: TargetValue; heightDifference: TargetValue };
}

export interface BoltTorques {
  bolts: { boltSize: string; torqueNm: number }[];
  source: string;
  typicalByProfile: { profileSize: number; boltSize: string }[];
  typicalSource: string;
}

export const PHASE_LABELS: Record<SweepPhase, string> = { 'as-found': 'As found', 'as-left': 'As left' };

/** One key factory for rails; machine-scoped lists sit under the machine's id. */
export const railKeys = {
  all: ['rails'] as const,
  list: (machineId: string) => [...railKeys.all, 'machine', machineId] as const,
  detail: (id: string) => [...railKeys.all, 'detail', id] as const,
  sweeps: (id: string) => [...railKeys.all, 'sweeps', id] as const,
  parallelism: (id: string) => [...railKeys.all, 'parallelism', id] as const,
  boltTorques: () => [...railKeys.all, 'bolt-torques'] as const,
  preview: (body: unknown) => [...railKeys.all, 'preview', body] as const,
};
