import { fitLine } from './linear-fit.js';
import { minimumZoneLine } from './minimum-zone.js';
import { MAX_POINTS, ascendingOrder, requireNumberArray, requireSameLength, requireFiniteResult } from './validate.js';

/**
 * Straightness of a rail from indicator readings at stations along it (all in mm).
 * Each straightness is the max − min of the readings' deviations from its reference line.
 */

export interface StraightnessInput {
  positionsMm: readonly number[];
  readingsMm: readonly number[];
}

export interface ReferenceLineResult {
  /** Reading change per unit of station position (mm/mm). */
  slope: number;
  /** Reference line reading at position 0. */
  interceptMm: number;
  straightnessMm: number;
  /** Reading minus reference line, per station in input order. */
  residualsMm: number[];
}

export interface StraightnessResult {
  leastSquares: ReferenceLineResult;
  /** Centre line of the minimum-zone band; the band is the line ± straightnessMm / 2. */
  minimumZone: ReferenceLineResult;
  /** Line through the readings at the first and last stations (lowest and highest position). */
  endPoint: ReferenceLineResult;
}

export const MIN_STRAIGHTNESS_POINTS = 3;

export interface StraightnessOptions {
  /** Largest station count accepted (MAX_POINTS by default; the bench lifts it). */
  maxPoints?: number;
}

function againstLine(
  positions: readonly number[],
  readings: readonly number[],
  slope: number,
  intercept: number,
): ReferenceLineResult {
  const n = positions.length;
  const residuals = new Array<number>(n);
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < n; i++) {
    const r = readings[i] - (slope * positions[i] + intercept);
    residuals[i] = r;
    if (r < min) min = r;
    if (r > max) max = r;
  }
  return { slope, interceptMm: intercept, straightnessMm: max - min, residualsMm: residuals };
}

function validated(input: StraightnessInput, options: StraightnessOptions) {
  const max = options.maxPoints ?? MAX_POINTS;
  const positions = requireNumberArray('positions', input.positionsMm, MIN_STRAIGHTNESS_POINTS, max);
  const readings = requireNumberArray('readings', input.readingsMm, 0, max);
  requireSameLength('positions', positions, 'readings', readings);
  const order = ascendingOrder('positions', positions);
  return { positions, readings, order };
}

export function leastSquaresStraightness(
  input: StraightnessInput,
  options: StraightnessOptions = {},
): ReferenceLineResult {
  const { positions, readings } = validated(input, options);
  const fit = fitLine(positions, readings);
  return againstLine(positions, readings, fit.slope, fit.intercept);
}

export function minimumZoneStraightness(
  input: StraightnessInput,
  options: StraightnessOptions = {},
): ReferenceLineResult {
  const { positions, readings, order } = validated(input, options);
  const zone = minimumZoneLine(positions, readings, order);
  return againstLine(positions, readings, zone.slope, zone.intercept);
}

export function endPointStraightness(input: StraightnessInput, options: StraightnessOptions = {}): ReferenceLineResult {
  const { positions, readings, order } = validated(input, options);
  return endPointFrom(positions, readings, order);
}

function endPointFrom(positions: readonly number[], readings: readonly number[], order: Uint32Array | null) {
  const first = order ? order[0] : 0;
  const last = order ? order[order.length - 1] : positions.length - 1;
  const slope = (readings[last] - readings[first]) / (positions[last] - positions[first]);
  const intercept = readings[first] - slope * positions[first];
  return againstLine(positions, readings, slope, intercept);
}

export function evaluateStraightness(input: StraightnessInput, options: StraightnessOptions = {}): StraightnessResult {
  const { positions, readings, order } = validated(input, options);
  const fit = fitLine(positions, readings);
  const zone = minimumZoneLine(positions, readings, order);
  return requireFiniteResult('readingsMm', {
    leastSquares: againstLine(positions, readings, fit.slope, fit.intercept),
    minimumZone: againstLine(positions, readings, zone.slope, zone.intercept),
    endPoint: endPointFrom(positions, readings, order),
  });
}
