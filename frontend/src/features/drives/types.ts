import type { LengthUnit } from '../../lib/units';

export type DriveType = 'screw' | 'belt' | 'rack';
export type Mounting = 'fixed-free' | 'supported-supported' | 'fixed-supported' | 'fixed-fixed';
export type DriveStatus = 'not-started' | 'within-target' | 'outside-target' | 'not-applicable';

export interface TargetValue {
  value: number;
  unit: string;
  source?: string;
}

/** Something a person should know about a result: kept with the record. */
export interface ResultWarning {
  code: string;
  message: string;
}

export type ScaleMaterial = 'steel' | 'stainless-steel' | 'aluminium' | 'glass' | 'invar';
export const SCALE_MATERIAL_LABELS: Record<ScaleMaterial, string> = {
  steel: 'Steel (tape, rule)',
  'stainless-steel': 'Stainless steel',
  aluminium: 'Aluminium',
  glass: 'Glass scale',
  invar: 'Invar',
};

/** How a record was referred to 20 °C. */
export interface ThermalReference {
  applied: boolean;
  machineTemperatureC: number | null;
  scaleTemperatureC: number | null;
  scaleMaterial: ScaleMaterial;
  scaleAlphaUmPerMK: number;
  machineAlphaUmPerMK: number;
  factor: number;
  source: string;
}

/** What a trial or run records about temperature and the instrument. */
export interface RecordConditions {
  machineTemperature: number | null;
  scaleTemperature: number | null;
  scaleMaterial: ScaleMaterial | null;
  instrumentResolution: number | null;
  thermal: ThermalReference | null;
}

export interface Drive {
  type: DriveType;
  lead?: number;
  threadsPerInch?: number;
  nominalDiameter?: number;
  rootDiameter?: number;
  unsupportedLength?: number;
  mounting?: Mounting;
  dnLimit?: number;
  beltPitch?: number;
  pulleyTeeth?: number;
  pinionModule?: number;
  pinionTeeth?: number;
}

export interface StepsChange {
  from: number;
  to: number;
  at: string;
  by: string;
  reason: 'edited' | 'travel-trial';
  trialId?: string;
}

export interface Axis {
  id: string;
  machineId: string;
  name: string;
  letter: string | null;
  /** Drive lengths, feed rates (per minute) and travel are in it. */
  lengthUnit: LengthUnit;
  drive: Drive;
  driveMm: Drive;
  driveSummary: string;
  motorStepsPerRev: number;
  microsteps: number;
  gearRatio: number;
  stepsPerMm: number;
  theoreticalStepsPerMm: number;
  stepsPerMmDifferencePercent: number;
  stepsPerInch: number;
  theoreticalStepsPerInch: number;
  travelPerRevMm: number;
  travelPerRev: number;
  resolutionMm: number;
  /** lengthUnit per minute. */
  maxFeedRate: number | null;
  maxFeedRateMmPerMin: number | null;
  measuredTravel: number | null;
  measuredTravelMm: number | null;
  notes: string;
  stepsHistory: StepsChange[];
  locked: boolean;
  createdAt: string;
  updatedAt: string;
}

export interface CheckSummary {
  status: DriveStatus;
  summary: string;
  headline: string | null;
  recordId: string | null;
  recordedAt: string | null;
}

export interface AxisListItem extends Axis {
  checks: { travelTrial: CheckSummary; positioning: CheckSummary; speedCheck: CheckSummary };
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

export interface SpeedCheck {
  axisId: string;
  applicable: boolean;
  status: DriveStatus;
  reason: string | null;
  missing: string[];
  lengthUnit: LengthUnit;
  /** lengthUnit per minute, as are maxFeedRate and safeFeedRate. */
  feedRate: number | null;
  feedRateMmPerMin: number | null;
  rpm: number | null;
  criticalSpeed: number | null;
  permissibleSpeed: number | null;
  dnLimitSpeed: number | null;
  dnLimit: number | null;
  mountingFactor: number | null;
  limitedBy: 'critical-speed' | 'dn-limit' | null;
  /** The lower of the permissible and the d·n limit speeds, rpm; headroom is taken from it. */
  limitSpeed: number | null;
  headroomPercent: number | null;
  maxFeedRate: number | null;
  allowedSpeed: number | null;
  safeFeedRate: number | null;
  safeFeedRateMmPerMin: number | null;
  headroom: TargetValue;
  withinLimits: boolean | null;
  source: string;
}

export interface TravelEnvelope {
  machineId: string;
  status: 'within-target' | 'outside-target' | 'not-started';
  workArea: { x: number; y: number };
  margin: TargetValue;
  marginMm: number;
  axes: { axisId: string; axis: string; letter: 'X' | 'Y'; measuredTravel: number | null; workSize: number; requiredTravel: number; spare: number | null; covers: boolean | null }[];
  missing: string[];
  summary: string;
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
