import { EngineInputError } from './engine-input-error.js';
import { requirePositive, requireFiniteResult } from './validate.js';

/**
 * Squareness of a gantry from the two diagonals of a rectangle it traced (or that was measured on
 * the frame). The four corners are taken as a parallelogram with sides a (X) and b (Y); by the law
 * of cosines its diagonals satisfy p², q² = a² + b² ∓ 2ab·cos θ, so the corner angle's deviation
 * from 90° is γ with sin γ = (q² − p²) / (4ab), q being the longer diagonal. The corners at the
 * ends of the longer diagonal are the acute ones.
 */

export interface SquarenessInput {
  sideXMm: number;
  sideYMm: number;
  diagonal1Mm: number;
  diagonal2Mm: number;
  /** Distance over which one side of the gantry is moved to square it; sideX when absent. */
  gantrySpanMm?: number;
}

export interface SquarenessResult {
  outOfSquareRad: number;
  outOfSquareDeg: number;
  outOfSquareArcsec: number;
  /** Lateral error per metre of travel: tan γ × 1000. */
  mmPerMetre: number;
  /** Which diagonal is longer: 1 or 2, its number (no unit; 1 when they are equal, with a zero angle). */
  longDiagonal: 1 | 2;
  diagonalDifferenceMm: number;
  /** How far to move one side of the gantry, over the gantry span, to make it square: span × tan γ. */
  correctionMm: number;
  spanMm: number;
  warnings: string[];
}

// Diagonals of a parallelogram obey p² + q² = 2(a² + b²). A larger misfit than this means the
// sides and diagonals were not measured on the same rectangle (or not in the same unit).
const PARALLELOGRAM_MISFIT_WARNING = 0.005;

export function evaluateSquareness(input: SquarenessInput): SquarenessResult {
  const a = requirePositive('sideX', input.sideXMm);
  const b = requirePositive('sideY', input.sideYMm);
  const d1 = requirePositive('diagonal1', input.diagonal1Mm);
  const d2 = requirePositive('diagonal2', input.diagonal2Mm);
  const span = input.gantrySpanMm == null ? a : requirePositive('gantrySpan', input.gantrySpanMm);

  const longDiagonal: 1 | 2 = d1 >= d2 ? 1 : 2;
  const q = Math.max(d1, d2);
  const p = Math.min(d1, d2);
  // (q − p)(q + p) avoids the cancellation of q² − p² for nearly equal diagonals.
  const sinGamma = ((q - p) * (q + p)) / (4 * a * b);
  if (sinGamma > 1) {
    throw new EngineInputError(
      'the diagonals differ by more than any parallelogram with these sides allows; check the sides and diagonals',
      'diagonal2',
    );
  }
  const gamma = Math.asin(sinGamma);
  const tanGamma = Math.tan(gamma);

  const warnings: string[] = [];
  const misfit = Math.abs(p * p + q * q - 2 * (a * a + b * b)) / (2 * (a * a + b * b));
  if (misfit > PARALLELOGRAM_MISFIT_WARNING) {
    warnings.push(
      `the diagonals do not match the sides (expected about ${Math.hypot(a, b).toFixed(1)} mm each); check that all four lengths come from the same rectangle and unit`,
    );
  }

  return requireFiniteResult('the sides and diagonals', {
    outOfSquareRad: gamma,
    outOfSquareDeg: (gamma * 180) / Math.PI,
    outOfSquareArcsec: (gamma * 180 * 3600) / Math.PI,
    mmPerMetre: tanGamma * 1000,
    longDiagonal,
    diagonalDifferenceMm: q - p,
    correctionMm: span * tanGamma,
    spanMm: span,
    warnings,
  });
}
