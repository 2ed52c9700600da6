import type { LengthUnit } from '../../lib/units';

// Requests and responses of the calculators API. Positions and lengths in mm; readings in
// `unit`; every length in a response is in mm.

export interface ReferenceLine {
  slope: number;
  intercept: number;
  straightness: number;
  residuals: number[];
}

export interface StraightnessRequest {
  positions: number[];
  readings: number[];
  unit: LengthUnit;
}
export interface StraightnessResult {
  leastSquares: ReferenceLine;
  /** Centre line of the band; the band is the line ± straightness / 2. */
  minimumZone: ReferenceLine;
  endPoint: ReferenceLine;
}

export interface ParallelismRequest {
  positions: number[];
  railA: number[];
  railB: number[];
  unit: LengthUnit;
}
export interface ParallelismResult {
  parallelism: number;
  meanOffset: number;
  differences: number[];
}

export interface SquarenessRequest {
  sideX: number;
  sideY: number;
  diagonal1: number;
  diagonal2: number;
  gantrySpan?: number;
}
export interface SquarenessResult {
  outOfSquareDeg: number;
  outOfSquareArcsec: number;
  mmPerMetre: number;
  longDiagonal: 1 | 2;
  diagonalDifference: number;
  correction: number;
  span: number;
  warnings: string[];
}

export interface FlatnessRequest {
  points: { x: number; y: number; z: number }[];
  unit: LengthUnit;
}
export interface FlatnessResult {
  leastSquares: { a: number; b: number; c: number; flatness: number; residuals: number[] };
  tilt: { xMmPerMetre: number; yMmPerMetre: number; mmPerMetre: number; directionDeg: number };
}

export type DriveType = 'screw' | 'belt' | 'rack';
export interface DriveRequest {
  type: DriveType;
  motorStepsPerRev: number;
  microsteps: number;
  gearRatio?: number;
  lead?: number;
  beltPitch?: number;
  pulleyTeeth?: number;
  pinionTeeth?: number;
  pinionModule?: number;
}
export interface DriveResult {
  travelPerRev: number;
  travelPerMotorRev: number;
  stepsPerMm: number;
  resolution: number;
}

export interface TravelTrialRequest {
  stepsPerMmUsed: number;
  moves: { commanded: number; measured: number }[];
  unit: LengthUnit;
}
export interface TravelTrialResult {
  scale: number;
  offset: number;
  correctedStepsPerMm: number;
  errorPercent: number;
  residualMax: number;
  moves: { commanded: number; measured: number; error: number; residual: number }[];
}

export interface PositioningRequest {
  targets: number[];
  runs: { direction: 'up' | 'down'; deviations: number[] }[];
  unit: LengthUnit;
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
export interface PositioningResult {
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
  warnings: string[];
}

export type Mounting = 'fixed-free' | 'supported-supported' | 'fixed-supported' | 'fixed-fixed';
export interface ScrewSpeedRequest {
  nominalDiameter: number;
  rootDiameter: number;
  unsupportedLength: number;
  lead: number;
  mounting: Mounting;
  feedRate: number;
  dnLimit?: number;
}
export interface ScrewSpeedResult {
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
