import type { AnswerOf, Schemas } from '../../lib/api/schemas';
import type { LengthUnit } from '../../lib/units';

export type Drive = Schemas['DriveRecord'];
export type DriveType = Drive['type'];
export type Mounting = NonNullable<Drive['mounting']>;
export type TargetValue = Schemas['TargetValue'];
export type ResultWarning = Schemas['ResultWarning'];
export type ThermalReference = Schemas['ThermalReference'];
export type ScaleMaterial = ThermalReference['scaleMaterial'];
export type StepsChange = Schemas['StepsChange'];
export type Axis = Schemas['AxisResponse'];
export type CheckSummary = Schemas['AxisCheckSummary'];
export type DriveStatus = CheckSummary['status'];
export type AxisListItem = AnswerOf<'/api/machines/{id}/axes', 'get'>[number];
export type SpeedCheck = Schemas['SpeedCheckResponse'];
export type TravelEnvelope = Schemas['TravelEnvelopeResponse'];

export const SCALE_MATERIAL_LABELS: Record<ScaleMaterial, string> = {
  steel: 'Steel (tape, rule)',
  'stainless-steel': 'Stainless steel',
  aluminium: 'Aluminium',
  glass: 'Glass scale',
  invar: 'Invar',
};

/** What a trial or run records about temperature and the instrument. */
export interface RecordConditions {
  machineTemperature: number | null;
  scaleTemperature: number | null;
  scaleMaterial: ScaleMaterial | null;
  instrumentResolution: number | null;
  thermal: ThermalReference | null;
}

export interface TravelTrial extends RecordConditions {
  id: string;
  axisId: string;
  lengthUnit: LengthUnit;
  readingUnit: LengthUnit;
  warnings: ResultWarning[];
  stepsPerMmUsed: number;
  throughOrigin: boolean;
  moves: { commanded: number; measured: number }[];
  result: {
    correctedStepsPerMm: number;
    errorPercent: number;
    scale: number;
    offset: number;
    residuals: number[];
    residualMax: number;
    moves: { commanded: number; measured: number; error: number; residual: number }[];
    theoryDifferencePercent: number | null;
    farFromTheory: boolean;
    thermalCorrectionPercent: number;
  } | null;
  /** Present when the stored result cannot be read (result is then null). */
  unreadable?: string;
  status: 'within-target' | 'outside-target';
  target: TargetValue;
  notes: string;
  recordedBy: string;
  recordedAt: string;
  appliedAt: string | null;
  appliedBy: string | null;
  locked: boolean;
}

export interface PositioningTargetResult {
  target: number;
  meanUp: number;
  meanDown: number;
  mean: number;
  reversal: number;
  sUp: number;
  sDown: number;
  repeatabilityUp: number;
  repeatabilityDown: number;
  repeatability: number;
}

export interface Verdict {
  value: number;
  target: TargetValue;
  targetMm: number;
  pass: boolean;
}

export interface PositioningRun extends RecordConditions {
  id: string;
  axisId: string;
  lengthUnit: LengthUnit;
  readingUnit: LengthUnit;
  warnings: ResultWarning[];
  targets: number[];
  runs: { direction: 'up' | 'down'; deviations: number[] }[];
  result: {
    accuracy: number;
    accuracyUp: number;
    accuracyDown: number;
    repeatability: number;
    repeatabilityUp: number;
    repeatabilityDown: number;
    reversal: number;
    reversalMean: number;
    systematic: number;
    systematicUp: number;
    systematicDown: number;
    meanRange: number;
    runsUp: number;
    runsDown: number;
    targets: PositioningTargetResult[];
    warnings: ResultWarning[];
    thermalCorrectionMax: number;
  } | null;
  /** null with `result` when the stored result cannot be read (then `unreadable` says so). */
  checks: { accuracy: Verdict; repeatability: Verdict; reversal: Verdict } | null;
  unreadable?: string;
  status: 'within-target' | 'outside-target';
  notes: string;
  recordedBy: string;
  recordedAt: string;
  locked: boolean;
}

export const DRIVE_LABELS: Record<DriveType, string> = { screw: 'Screw', belt: 'Belt', rack: 'Rack and pinion' };
export const MOUNTING_LABELS: Record<Mounting, string> = {
  'fixed-free': 'Fixed – free',
  'supported-supported': 'Supported – supported',
  'fixed-supported': 'Fixed – supported',
  'fixed-fixed': 'Fixed – fixed',
};

/** One key factory for the feature. */
export const driveKeys = {
  all: ['drives'] as const,
  axes: (machineId: string) => [...driveKeys.all, 'axes', machineId] as const,
  axis: (axisId: string) => [...driveKeys.all, 'axis', axisId] as const,
  trials: (axisId: string) => [...driveKeys.all, 'axis', axisId, 'trials'] as const,
  runs: (axisId: string) => [...driveKeys.all, 'axis', axisId, 'runs'] as const,
  speed: (axisId: string) => [...driveKeys.all, 'axis', axisId, 'speed'] as const,
  envelope: (machineId: string) => [...driveKeys.all, 'envelope', machineId] as const,
  preview: (body: unknown) => [...driveKeys.all, 'preview', body] as const,
};
