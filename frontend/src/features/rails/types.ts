import type { LengthUnit } from '../../lib/units';

export type SweepPhase = 'as-found' | 'as-left';
export type SweepFace = 'side' | 'top';
export const FACE_LABELS: Record<SweepFace, string> = { side: 'Side face (sideways straightness)', top: 'Top face (heights)' };
export type SweepStatus = 'within-target' | 'outside-target';
export type CheckState = SweepStatus | 'not-comparable' | 'not-started';

export type StraightnessReference = 'minimum-zone' | 'least-squares';

export interface TargetValue {
  value: number;
  unit: string;
  reference?: StraightnessReference;
}

export interface ResultWarning {
  code: string;
  message: string;
}

export interface Rail {
  id: string;
  machineId: string;
  label: string;
  axis: string;
  /** Lengths as typed, in lengthUnit; the …Mm twins in mm. */
  lengthUnit: LengthUnit;
  length: number;
  holePitch: number;
  firstHole: number;
  spacing: number | null;
  endDistance: number;
  endDistanceIsDefault: boolean;
  lengthMm: number;
  profileSize: number | null;
  holePitchMm: number;
  firstHoleMm: number;
  spacingMm: number | null;
  endDistanceMm: number;
  partnerRailId: string | null;
  /** position in mm, at in lengthUnit. */
  holes: { index: number; position: number; at: number }[];
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
  face: SweepFace;
  readingUnit: LengthUnit;
  lengthUnit: LengthUnit;
  localSlopeMmPerM: number | null;
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

export interface LocalSlope {
  mmPerM: number;
  fromMm: number;
  toMm: number;
  baseMm: number | null;
}

export interface StraightnessResult {
  leastSquares: FitLine;
  minimumZone: FitLine;
  endPoint: FitLine;
  localSlope?: LocalSlope;
}

export interface Sweep {
  id: string;
  railId: string;
  machineId: string;
  /** Positions in lengthUnit, readings and resolution in readingUnit, as typed. */
  lengthUnit: LengthUnit;
  readingUnit: LengthUnit;
  face: SweepFace;
  /** null (with `unreadable`) when the stored readings cannot be read. */
  stations: { position: number; positionMm: number; reading: number; readingMm: number }[] | null;
  localSlope: LocalSlope | null;
  warnings: ResultWarning[];
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
  readingUnit: LengthUnit;
  lengthUnit: LengthUnit;
  face: SweepFace;
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
  face?: SweepFace;
  parallelismWithin?: boolean | null;
  heightDifferenceWithin?: boolean | null;
  height?: {
    measured: boolean;
    reason: string | null;
    datum: string | null;
    worst: number | null;
    at: number | null;
    spacing: number | null;
    kUmPerMm: number | null;
    permissible: number | null;
    targetText: string | null;
    within: boolean | null;
  };
  warnings: ResultWarning[];
  targets: { parallelism: TargetValue; heightDifference: TargetValue & { source?: string } };
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
