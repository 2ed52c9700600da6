import { EngineInputError } from './engine-input-error.js';
import { evaluateSquareness, type SquarenessResult } from './squareness.js';
import { requireNonNegative, requirePositive, requireFiniteResult } from './validate.js';

/**
 * Test-cut evaluation (common practice for commissioning a cutting table): a large square with
 * a circle, cut and measured. Outside sizes give each axis's scale error (steps per mm), the
 * square's diagonals give squareness, and the circle's diameters along X and Y show ovality,
 * which points to unequal scale or to backlash on one axis: lost motion at each reversal of an
 * axis makes the circle short by about the backlash along that axis.
 */

export interface CutSize {
  commandedMm: number;
  measuredMm: number;
}

export interface TestCutInput {
  x: CutSize;
  y: CutSize;
  stepsPerMmX?: number;
  stepsPerMmY?: number;
  diagonal1Mm?: number;
  diagonal2Mm?: number;
  gantrySpanMm?: number;
  circle?: { commandedDiameterMm: number; measuredXMm: number; measuredYMm: number };
  /** Ovality treated as round; 0.1 mm when absent. */
  ovalityToleranceMm?: number;
}

export interface AxisScaleResult {
  scale: number;
  errorMm: number;
  errorPercent: number;
  correctedStepsPerMm: number | null;
}

export type OvalityCause = 'round' | 'scale' | 'x-backlash' | 'y-backlash';

export interface OvalityResult {
  /** circleX − circleY. */
  ovalityMm: number;
  /** The part of the ovality that the two axes' scale errors account for. */
  fromScaleMm: number;
  unexplainedMm: number;
  pointsTo: OvalityCause;
  /** Backlash on the short axis suggested by the unexplained ovality (null unless backlash). */
  backlashEstimateMm: number | null;
}

export interface TestCutResult {
  x: AxisScaleResult;
  y: AxisScaleResult;
  squareness: SquarenessResult | null;
  ovality: OvalityResult | null;
  notes: string[];
}

export const DEFAULT_OVALITY_TOLERANCE_MM = 0.1;

function axisScale(field: string, size: CutSize, stepsPerMm: number | undefined): AxisScaleResult {
  if (!size || typeof size !== 'object') throw new EngineInputError(`${field} must be {commanded, measured}`, field);
  const commanded = requirePositive(`${field}.commanded`, size.commandedMm);
  const measured = requirePositive(`${field}.measured`, size.measuredMm);
  const scale = measured / commanded;
  return {
    scale,
    errorMm: measured - commanded,
    errorPercent: (scale - 1) * 100,
    correctedStepsPerMm:
      stepsPerMm == null ? null : requirePositive(`stepsPerMm${field.toUpperCase()}`, stepsPerMm) / scale,
  };
}

export function evaluateTestCut(input: TestCutInput): TestCutResult {
  const x = axisScale('x', input.x, input.stepsPerMmX);
  const y = axisScale('y', input.y, input.stepsPerMmY);
  const tolerance =
    input.ovalityToleranceMm == null
      ? DEFAULT_OVALITY_TOLERANCE_MM
      : requireNonNegative('ovalityTolerance', input.ovalityToleranceMm);
  const notes: string[] = [];

  let squareness: SquarenessResult | null = null;
  if ((input.diagonal1Mm == null) !== (input.diagonal2Mm == null)) {
    throw new EngineInputError('give both diagonals or neither', input.diagonal1Mm == null ? 'diagonal1' : 'diagonal2');
  }
  if (input.diagonal1Mm != null && input.diagonal2Mm != null) {
    squareness = evaluateSquareness({
      sideXMm: input.x.measuredMm,
      sideYMm: input.y.measuredMm,
      diagonal1Mm: input.diagonal1Mm,
      diagonal2Mm: input.diagonal2Mm,
      gantrySpanMm: input.gantrySpanMm,
    });
  }

  let ovality: OvalityResult | null = null;
  if (input.circle) {
    const d = requirePositive('circle.commandedDiameter', input.circle.commandedDiameterMm);
    const cx = requirePositive('circle.measuredX', input.circle.measuredXMm);
    const cy = requirePositive('circle.measuredY', input.circle.measuredYMm);
    const ovalityMm = cx - cy;
    const fromScaleMm = d * (x.scale - y.scale);
    const unexplainedMm = ovalityMm - fromScaleMm;
    let pointsTo: OvalityCause = 'round';
    if (Math.abs(ovalityMm) > tolerance) {
      if (Math.abs(unexplainedMm) <= tolerance) pointsTo = 'scale';
      else pointsTo = unexplainedMm < 0 ? 'x-backlash' : 'y-backlash';
    }
    const backlash = pointsTo === 'x-backlash' || pointsTo === 'y-backlash';
    ovality = {
      ovalityMm,
      fromScaleMm,
      unexplainedMm,
      pointsTo,
      backlashEstimateMm: backlash ? Math.abs(unexplainedMm) : null,
    };

    // Kerf compensation shifts every edge by the same amount, so it shows as the same error in
    // mm on the square and on the much smaller circle, where a scale error would be proportional.
    const circleError = (cx + cy) / 2 - d;
    const squareError = (x.errorMm + y.errorMm) / 2;
    const sizeRatio = (input.x.commandedMm + input.y.commandedMm) / 2 / d;
    if (
      sizeRatio > 2 &&
      Math.abs(squareError) > tolerance &&
      Math.abs(circleError - squareError) < Math.abs(squareError) / 3
    ) {
      notes.push(
        'the square and the circle are off by about the same amount in mm: check kerf width compensation before changing steps per mm',
      );
    }
  }
  if (squareness && (Math.abs(x.errorMm) > tolerance || Math.abs(y.errorMm) > tolerance)) {
    notes.push('set steps per mm first, then square the gantry, re-home and cut again');
  }
  return requireFiniteResult('the measured sizes', { x, y, squareness, ovality, notes });
}
