import { EngineInputError } from './engine-input-error.js';
import { fitLine, fitLineThroughOrigin } from './linear-fit.js';
import { requireCount, requireFinite, requirePositive, requireFiniteResult } from './validate.js';
import type { ResultWarning } from './warnings.js';

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
  /** The drive's theoretical steps per mm; a correction far from it is flagged. */
  theoreticalStepsPerMm?: number;
  /**
   * Fraction to add to each measured length to refer it to the machine at 20 °C
   * (thermal.ts: α_scale·ΔT_scale − α_machine·ΔT_machine); 0 when absent.
   */
  thermalFactor?: number;
}

/** Corrections further than this from the drive's theoretical steps per mm are held back. */
export const FAR_FROM_THEORY_PERCENT = 5;
/** A scale outside 1/2…2 is a wrong setting (lead, teeth, microsteps), never a tuning error. */
export const IMPLAUSIBLE_SCALE = { min: 0.5, max: 2 } as const;

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
  /** Corrected against theoretical steps per mm, %; null without a theoretical value. */
  theoryDifferencePercent: number | null;
  /** The correction is over FAR_FROM_THEORY_PERCENT from theory (or cannot be right): apply only on confirmation. */
  farFromTheory: boolean;
  /** The thermal factor used, as a percentage of length (0 when no correction was made). */
  thermalCorrectionPercent: number;
  warnings: ResultWarning[];
}

export function evaluateTravelTrial(input: TravelTrialInput): TravelTrialResult {
  const used = requirePositive('stepsPerMmUsed', input.stepsPerMmUsed);
  if (!Array.isArray(input.moves)) throw new EngineInputError('moves must be a list of {commanded, measured}', 'moves');
  requireCount('moves', input.moves.length, 1);
  const thermal = input.thermalFactor == null ? 0 : requireFinite('thermalFactor', input.thermalFactor);
  const commanded = new Array<number>(input.moves.length);
  const measured = new Array<number>(input.moves.length);
  input.moves.forEach((m, i) => {
    if (m === null || typeof m !== 'object')
      throw new EngineInputError(`moves[${i}] must be {commanded, measured}`, 'moves');
    commanded[i] = requireFinite(`moves[${i}].commanded`, m.commandedMm);
    measured[i] = requireFinite(`moves[${i}].measured`, m.measuredMm) * (1 + thermal);
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

  const corrected = used / scale;
  const theory =
    input.theoreticalStepsPerMm == null ? null : requirePositive('theoreticalStepsPerMm', input.theoreticalStepsPerMm);
  const theoryDifferencePercent = theory === null ? null : (corrected / theory - 1) * 100;
  const implausible = scale < IMPLAUSIBLE_SCALE.min || scale > IMPLAUSIBLE_SCALE.max;
  const far = theoryDifferencePercent !== null && Math.abs(theoryDifferencePercent) > FAR_FROM_THEORY_PERCENT;
  const warnings: ResultWarning[] = [];
  if (implausible) {
    warnings.push({
      code: 'correction-cannot-be-right',
      message: `The axis moved ${(scale * 100).toPrecision(4)} % of the commanded distance: a correction of ${(1 / scale).toPrecision(4)}× cannot come from tuning. Check that the commanded and measured moves are in the same unit and that lead, pulley teeth and microsteps are right.`,
    });
  }
  if (far) {
    warnings.push({
      code: 'correction-far-from-theory',
      message: `The corrected ${corrected.toFixed(4)} steps/mm is ${theoryDifferencePercent! >= 0 ? '+' : ''}${theoryDifferencePercent!.toFixed(1)} % from the drive's theoretical ${theory!.toFixed(4)} steps/mm (more than ${FAR_FROM_THEORY_PERCENT} %). The usual causes are the screw's pitch taken for its lead (multi-start screws), the wrong number of pulley teeth, or the driver's microsteps not matching the setting; fix the drive record before applying it.`,
    });
  }
  if (commanded.length === 1 || allSame) {
    warnings.push({
      code: 'single-distance',
      message:
        'Every move has the same commanded distance, so a scale error cannot be told from an offset at the start; moves of several lengths, the longest as long as the axis allows, give a firmer correction.',
    });
  }
  return requireFiniteResult('moves', {
    scale,
    offsetMm: offset,
    correctedStepsPerMm: corrected,
    errorPercent: (scale - 1) * 100,
    residualMaxMm: residualMax,
    moves,
    theoryDifferencePercent,
    farFromTheory: far || implausible,
    thermalCorrectionPercent: thermal * 100,
    warnings,
  });
}
