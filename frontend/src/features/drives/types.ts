import type { AnswerOf, Schemas } from '../../lib/api/schemas';

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

/** A trial with its moves and fit: moves in lengthUnit, readings in readingUnit. */
export type TravelTrial = AnswerOf<'/api/axes/{id}/travel-trials/{trialId}', 'get'>;
/** A run with its deviations (readingUnit) at its targets (lengthUnit) and its per-target results. */
export type PositioningRun = AnswerOf<'/api/axes/{id}/positioning-runs/{runId}', 'get'>;
export type PositioningTargetResult = NonNullable<PositioningRun['result']>['targets'][number];
export type Verdict = NonNullable<PositioningRun['checks']>['accuracy'];

/** What a trial or run records about temperature and the instrument. */
export type RecordConditions = Pick<
  TravelTrial,
  'machineTemperature' | 'scaleTemperature' | 'scaleMaterial' | 'instrumentResolution' | 'thermal'
>;

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
