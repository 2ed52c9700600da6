import type { LengthUnit } from '../../lib/units';

// Requests and responses of the calculators API. Lengths (positions, moves, sizes, lead, travel)
// in `lengthUnit`, readings (indicator readings, deviations, heights) in `readingUnit`; every
// length in a response is in mm, and `units` names the unit of each result field.

/** The two unit families every calculator request names (the server takes mm when absent). */
export interface UnitFamilies {
  lengthUnit: LengthUnit;
  readingUnit: LengthUnit;
}

/** Something a person should know about a result: a stable code and a plain sentence. */
export interface ResultWarning {
  code: string;
  message: string;
}

/** What every calculator answers besides its own figures. */
export interface CalculatedCommon extends UnitFamilies {
  units: Record<string, string>;
  warnings: ResultWarning[];
}

export interface ReferenceLine {
  slope: number;
  intercept: number;
  straightness: number;
  residuals: number[];
}

export interface StraightnessRequest extends UnitFamilies {
  positions: number[];
  readings: number[];
}
export interface StraightnessResult extends CalculatedCommon {
  leastSquares: ReferenceLine;
  /** Centre line of the band; the band is the line ± straightness / 2. */
  minimumZone: ReferenceLine;
  endPoint: ReferenceLine;
}

export interface ParallelismRequest extends UnitFamilies {
  positions: number[];
  railA: number[];
  railB: number[];
}
export interface ParallelismResult extends CalculatedCommon {
  parallelism: number;
  meanOffset: number;
  differences: number[];
}

export interface SquarenessRequest extends UnitFamilies {
  sideX: number;
  sideY: number;
  diagonal1: number;
  diagonal2: number;
  gantrySpan?: number;
}
export interface SquarenessResult extends CalculatedCommon {
  outOfSquareDeg: number;
  outOfSquareArcsec: number;
  mmPerMetre: number;
  longDiagonal: 1 | 2;
  diagonalDifference: number;
  correction: number;
  span: number;
}

export interface FlatnessRequest extends UnitFamilies {
  points: { x: number; y: number; z: number }[];
}
export interface FlatnessResult extends CalculatedCommon {
  leastSquares: { a: number; b: number; c: number; flatness: number; residuals: number[] };
  tilt: { xMmPerMetre: number; yMmPerMetre: number; mmPerMetre: number; directionDeg: number };
}

export type DriveType = 'screw' | 'belt' | 'rack';
export interface DriveRequest extends UnitFamilies {
  type: DriveType;
  motorStepsPerRev: number;
  microsteps: number;
  gearRatio?: number;
  lead?: number;
  threadsPerInch?: number;
  beltPitch?: number;
  pulleyTeeth?: number;
  pinionTeeth?: number;
  pinionModule?: number;
}
export interface DriveResult extends CalculatedCommon {
  travelPerRev: number;
  travelPerMotorRev: number;
  stepsPerMm: number;
  stepsPerIn: number;
  resolution: number;
}

export interface TravelTrialRequest extends UnitFamilies {
  stepsPerMmUsed: number;
  theoreticalStepsPerMm?: number;
  moves: { commanded: number; measured: number }[];
}
export interface TravelTrialResult extends CalculatedCommon {
  scale: number;
  offset: number;
  correctedStepsPerMm: number;
  correctedStepsPerIn: number;
  errorPercent: number;
  residualMax: number;
  moves: { commanded: number; measured: number; error: number; residual: number }[];
}

export interface PositioningRequest extends UnitFamilies {
  targets: number[];
  runs: { direction: 'up' | 'down'; deviations: number[] }[];
}
export interface PositioningTarget {
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
export interface PositioningResult extends CalculatedCommon {
  targets: PositioningTarget[];
  reversal: number;
  reversalMean: number;
  repeatabilityUp: number;
  repeatabilityDown: number;
  repeatability: number;
  systematicUp: number;
  systematicDown: number;
  systematic: number;
  meanRange: number;
  accuracyUp: number;
  accuracyDown: number;
  accuracy: number;
  runsUp: number;
  runsDown: number;
}

export type Mounting = 'fixed-free' | 'supported-supported' | 'fixed-supported' | 'fixed-fixed';
export interface ScrewSpeedRequest extends UnitFamilies {
  nominalDiameter: number;
  rootDiameter: number;
  unsupportedLength: number;
  lead: number;
  mounting: Mounting;
  feedRate: number;
  dnLimit?: number;
}
export interface ScrewSpeedResult extends CalculatedCommon {
  rpm: number;
  criticalSpeed: number;
  permissibleSpeed: number;
  dnLimitSpeed: number;
  maxFeedRate: number;
  withinLimits: boolean;
  limitedBy: 'critical-speed' | 'dn-limit';
  mountingFactor: number;
  dnLimit: number;
  source: string;
}

/** Query keys: one per calculator, with the request body so equal inputs share a result. */
export const calculatorKeys = {
  all: ['calculators'] as const,
  run: (calculator: string, body: unknown) => ['calculators', calculator, body] as const,
};
