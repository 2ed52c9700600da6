import { EngineInputError } from './engine-input-error.js';
import { fitLine, fitLineThroughOrigin } from './linear-fit.js';
import { requireCount, requireFinite, requirePositive, requireFiniteResult } from './validate.js';

/**
 * Travel trial: commanded moves against measured moves of one axis (mm). A least-squares line
 * measured = scale · commanded + offset gives the scale error, and the steps per mm that would
 * have made the axis move as commanded: corrected = used / scale (the long-move rule
 * new = old × commanded ÷ measured, generalised to several moves).
 */

export interface TravelMove {
  commandedMm: number;
  measuredMm: number;
}

export interface TravelTrialInput {
  stepsPerMmUsed: number;
  moves: readonly TravelMove[];
  /** Fit measured = scale · commanded with no offset (for moves measured from a zeroed start). */
  throughOrigin?: boolean;
}

export interface TravelTrialMoveResult extends TravelMove {
  /** measured − commanded. */
  errorMm: number;
  /** measured − fitted line. */
  residualMm: number;
}

export interface TravelTrialResult {
  scale: number;
  offsetMm: number;
  correctedStepsPerMm: number;
  errorPercent: number;
  residualMaxMm: number;
  moves: TravelTrialMoveResult[];
}

export function evaluateTravelTrial(input: TravelTrialInput): TravelTrialResult {
  const used = requirePositive('stepsPerMmUsed', input.stepsPerMmUsed);
  if (!Array.isArray(input.moves)) throw new EngineInputError('moves must be a list of {commanded, measured}', 'moves');
  requireCount('moves', input.moves.length, 1);
  const commanded = new Array<number>(input.moves.length);
  const measured = new Array<number>(input.moves.length);
  input.moves.forEach((m, i) => {
    if (m === null || typeof m !== 'object') throw new EngineInputError(`moves[${i}] must be {commanded, measured}`, 'moves');
    commanded[i] = requireFinite(`moves[${i}].commanded`, m.commandedMm);
    measured[i] = requireFinite(`moves[${i}].measured`, m.measuredMm);
    if (commanded[i] === 0) throw new EngineInputError(`moves[${i}].commanded must not be zero`, 'moves');
  });

  const allSame = commanded.every((c) => c === commanded[0]);
  let scale: number;
  let offset = 0;
  if (input.throughOrigin || allSame) {
    // One move, or the same move repeated: an offset cannot be told apart from scale, so the
    // line goes through the origin (for a single move, scale = measured / commanded).
    scale = fitLineThroughOrigin(commanded, measured).slope;
  } else {
    const fit = fitLine(commanded, measured);
    scale = fit.slope;
    offset = fit.intercept;
  }
  if (!(scale > 0)) {
    throw new EngineInputError('measured moves must grow with the commanded moves (same direction)', 'moves');
  }

  let residualMax = 0;
  const moves = commanded.map((c, i) => {
    const residual = measured[i] - (scale * c + offset);
    residualMax = Math.max(residualMax, Math.abs(residual));
    return { commandedMm: c, measuredMm: measured[i], errorMm: measured[i] - c, residualMm: residual };
  });

  return requireFiniteResult('moves', {
    scale,
    offsetMm: offset,
    correctedStepsPerMm: used / scale,
    errorPercent: (scale - 1) * 100,
    residualMaxMm: residualMax,
    moves,
  });
}
