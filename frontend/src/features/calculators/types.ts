import type { Schemas } from '../../lib/api/schemas';

// Requests and responses of the calculators API. Lengths (positions, moves, sizes, lead, travel)
// in `lengthUnit`, readings (indicator readings, deviations, heights) in `readingUnit`; every
// length in a response is in mm, and `units` names the unit of each result field.

/** The two unit families every calculator request names (the server takes mm when absent; the browser always sends both). */
export type UnitFamilies = Required<Pick<Schemas['StraightnessDto'], 'lengthUnit' | 'readingUnit'>>;

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

export type StraightnessRequest = Schemas['StraightnessDto'] & UnitFamilies;
export interface StraightnessResult extends CalculatedCommon {
  leastSquares: ReferenceLine;
  /** Centre line of the band; the band is the line ± straightness / 2. */
  minimumZone: ReferenceLine;
  endPoint: ReferenceLine;
}

export type ParallelismRequest = Schemas['ParallelismDto'] & UnitFamilies;
export interface ParallelismResult extends CalculatedCommon {
  parallelism: number;
  meanOffset: number;
  differences: number[];
}

export type SquarenessRequest = Schemas['SquarenessDto'] & UnitFamilies;
export interface SquarenessResult extends CalculatedCommon {
  outOfSquareDeg: number;
  outOfSquareArcsec: number;
  mmPerMetre: number;
  longDiagonal: 1 | 2;
  diagonalDifference: number;
  correction: number;
  span: number;
}

export type FlatnessRequest = Schemas['FlatnessDto'] & UnitFamilies;
export interface FlatnessResult extends CalculatedCommon {
  leastSquares: { a: number; b: number; c: number; flatness: number; residuals: number[] };
  tilt: { xMmPerMetre: number; yMmPerMetre: number; mmPerMetre: number; directionDeg: number };
}

export type DriveRequest = Schemas['DriveDto'] & UnitFamilies;
export type DriveType = DriveRequest['type'];
export interface DriveResult extends CalculatedCommon {
  travelPerRev: number;
  travelPerMotorRev: number;
  stepsPerMm: number;
  stepsPerIn: number;
  resolution: number;
}

export type TravelTrialRequest = Schemas['TravelTrialDto'] & UnitFamilies;
export interface TravelTrialResult extends CalculatedCommon {
  scale: number;
  offset: number;
  correctedStepsPerMm: number;
  correctedStepsPerIn: number;
  errorPercent: number;
  residualMax: number;
  moves: { commanded: number; measured: number; error: number; residual: number }[];
}

export type PositioningRequest = Schemas['PositioningDto'] & UnitFamilies;
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

export type ScrewSpeedRequest = Schemas['ScrewSpeedDto'] & UnitFamilies;
export type Mounting = ScrewSpeedRequest['mounting'];
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
