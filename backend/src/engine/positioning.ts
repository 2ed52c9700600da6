import { EngineInputError } from './engine-input-error.js';
import {
  MAX_POINTS,
  ascendingOrder,
  requireFinite,
  requireNumberArray,
  requirePositive,
  requireFiniteResult,
} from './validate.js';
import type { ResultWarning } from './warnings.js';

/**
 * Positioning accuracy and repeatability of a linear axis from a repeat-and-reverse run, with
 * the ISO 230-2 quantities: every target approached n times from below (up) and from above
 * (down); the deviation is actual − target (mm).
 */

export type Direction = 'up' | 'down';

export interface PositioningRun {
  direction: Direction;
  /** Deviation at each target, in the order of `targetsMm`. */
  deviationsMm: readonly number[];
}

export interface PositioningInput {
  targetsMm: readonly number[];
  runs: readonly PositioningRun[];
  /**
   * Fraction of the distance from the first target (where the scale is zeroed) to add to each
   * deviation to refer it to the machine at 20 °C (thermal.ts); 0 when absent.
   */
  thermalFactor?: number;
  /** Smallest step the instrument reads, mm; flagged when coarser than a quarter of the tolerance. */
  instrumentResolutionMm?: number;
  /** The tightest tolerance the figures are judged against, mm (for the resolution and thermal warnings). */
  toleranceMm?: number;
}

export interface TargetResult {
  targetMm: number;
  meanUpMm: number;
  meanDownMm: number;
  /** Mean bidirectional deviation (meanUp + meanDown) / 2. */
  meanMm: number;
  /** Reversal value B_i = meanUp − meanDown. */
  reversalMm: number;
  /** Estimator of unidirectional standard uncertainty (sample standard deviation, n − 1). */
  sUpMm: number;
  sDownMm: number;
  /** 4 s. */
  repeatabilityUpMm: number;
  repeatabilityDownMm: number;
  /** max(2 s↑ + 2 s↓ + |B_i|, R↑_i, R↓_i). */
  repeatabilityMm: number;
}

export interface PositioningResult {
  targets: TargetResult[];
  /** B = max |B_i|. */
  reversalMm: number;
  /** Mean of the signed B_i. */
  reversalMeanMm: number;
  repeatabilityUpMm: number;
  repeatabilityDownMm: number;
  repeatabilityMm: number;
  /** E↑, E↓: range of the mean unidirectional deviations; E over both directions. */
  systematicUpMm: number;
  systematicDownMm: number;
  systematicMm: number;
  /** M: range of the mean bidirectional deviations. */
  meanRangeMm: number;
  /** A↑, A↓, A: range of mean ± 2 s over the targets. */
  accuracyUpMm: number;
  accuracyDownMm: number;
  accuracyMm: number;
  runsUp: number;
  runsDown: number;
  /** Largest thermal correction made to a deviation, mm (0 when none). */
  thermalCorrectionMaxMm: number;
  warnings: ResultWarning[];
}

export const MIN_RUNS_PER_DIRECTION = 2;
/** Runs per direction and targets the standard test cycle asks for. */
export const STANDARD_RUNS_PER_DIRECTION = 5;
export const STANDARD_MIN_TARGETS = 5;
/** Targets per metre of travel the standard asks for (iso230_2_formulas.md, from memory). */
export const STANDARD_TARGETS_PER_METRE = 5;

/** Targets a travel needs: at least 5, and 5 per metre (iso230_2_formulas.md, from memory). */
export function targetsNeeded(travelMm: number): number {
  return Math.max(STANDARD_MIN_TARGETS, Math.ceil((STANDARD_TARGETS_PER_METRE * travelMm) / 1000 - 1e-9));
}

function meanAndS(values: number[]): { mean: number; s: number } {
  const n = values.length;
  let sum = 0;
  for (const v of values) sum += v;
  const mean = sum / n;
  let ss = 0;
  for (const v of values) ss += (v - mean) * (v - mean);
  return { mean, s: Math.sqrt(ss / (n - 1)) };
}

// Loops rather than Math.max(...values): spreading tens of thousands of targets overflows the stack.
function maxOf(...lists: number[][]): number {
  let max = -Infinity;
  for (const list of lists) for (const v of list) if (v > max) max = v;
  return max;
}

function minOf(...lists: number[][]): number {
  let min = Infinity;
  for (const list of lists) for (const v of list) if (v < min) min = v;
  return min;
}

function range(...lists: number[][]): number {
  return maxOf(...lists) - minOf(...lists);
}

export function evaluatePositioning(input: PositioningInput): PositioningResult {
  const targets = requireNumberArray('targets', input.targetsMm, 1);
  ascendingOrder('targets', targets);
  if (!Array.isArray(input.runs)) throw new EngineInputError('runs must be a list of {direction, deviations}', 'runs');
  const m = targets.length;
  if (m * input.runs.length > MAX_POINTS) {
    throw new EngineInputError(
      `runs hold ${m * input.runs.length} deviations; at most ${MAX_POINTS} are accepted`,
      'runs',
    );
  }

  const thermal = input.thermalFactor == null ? 0 : requireFinite('thermalFactor', input.thermalFactor);
  const up: number[][] = targets.map(() => []);
  const down: number[][] = targets.map(() => []);
  input.runs.forEach((run, r) => {
    if (run === null || typeof run !== 'object')
      throw new EngineInputError(`runs[${r}] must be {direction, deviations}`, 'runs');
    if (run.direction !== 'up' && run.direction !== 'down') {
      throw new EngineInputError(`runs[${r}].direction must be up or down`, 'runs');
    }
    const raw = requireNumberArray(`runs[${r}].deviations`, run.deviationsMm, 0);
    // Referred to 20 °C by the distance from the first target, where the scale reads zero (a copy: the input stays as given).
    const dev = thermal === 0 ? raw : raw.map((d, i) => d + ((targets[i] ?? targets[0]) - targets[0]) * thermal);
    if (dev.length !== m) {
      throw new EngineInputError(
        `runs[${r}].deviations must have one value per target (${m}, got ${dev.length})`,
        'runs',
      );
    }
    const bucket = run.direction === 'up' ? up : down;
    dev.forEach((d, i) => bucket[i].push(d));
  });
  const runsUp = up[0].length;
  const runsDown = down[0].length;
  for (const [name, count] of [
    ['up', runsUp],
    ['down', runsDown],
  ] as const) {
    if (count < MIN_RUNS_PER_DIRECTION) {
      throw new EngineInputError(
        `runs need at least ${MIN_RUNS_PER_DIRECTION} runs in the ${name} direction (got ${count})`,
        'runs',
      );
    }
  }

  const perTarget: TargetResult[] = targets.map((t, i) => {
    const u = meanAndS(up[i]);
    const d = meanAndS(down[i]);
    const reversal = u.mean - d.mean;
    const rUp = 4 * u.s;
    const rDown = 4 * d.s;
    return {
      targetMm: t,
      meanUpMm: u.mean,
      meanDownMm: d.mean,
      meanMm: (u.mean + d.mean) / 2,
      reversalMm: reversal,
      sUpMm: u.s,
      sDownMm: d.s,
      repeatabilityUpMm: rUp,
      repeatabilityDownMm: rDown,
      repeatabilityMm: Math.max(2 * u.s + 2 * d.s + Math.abs(reversal), rUp, rDown),
    };
  });

  const col = (f: (t: TargetResult) => number) => perTarget.map(f);
  const upperUp = col((t) => t.meanUpMm + 2 * t.sUpMm);
  const lowerUp = col((t) => t.meanUpMm - 2 * t.sUpMm);
  const upperDown = col((t) => t.meanDownMm + 2 * t.sDownMm);
  const lowerDown = col((t) => t.meanDownMm - 2 * t.sDownMm);

  const warnings = positioningWarnings(input, targets, runsUp, runsDown, thermal);
  const thermalCorrectionMaxMm = Math.abs((targets[m - 1] - targets[0]) * thermal);

  return requireFiniteResult('runs', {
    targets: perTarget,
    reversalMm: maxOf(col((t) => Math.abs(t.reversalMm))),
    reversalMeanMm: col((t) => t.reversalMm).reduce((s, v) => s + v, 0) / m,
    repeatabilityUpMm: maxOf(col((t) => t.repeatabilityUpMm)),
    repeatabilityDownMm: maxOf(col((t) => t.repeatabilityDownMm)),
    repeatabilityMm: maxOf(col((t) => t.repeatabilityMm)),
    systematicUpMm: range(col((t) => t.meanUpMm)),
    systematicDownMm: range(col((t) => t.meanDownMm)),
    systematicMm: range(
      col((t) => t.meanUpMm),
      col((t) => t.meanDownMm),
    ),
    meanRangeMm: range(col((t) => t.meanMm)),
    accuracyUpMm: maxOf(upperUp) - minOf(lowerUp),
    accuracyDownMm: maxOf(upperDown) - minOf(lowerDown),
    accuracyMm: maxOf(upperUp, upperDown) - minOf(lowerUp, lowerDown),
    runsUp,
    runsDown,
    thermalCorrectionMaxMm,
    warnings,
  });
}

const um = (mm: number) => `${(mm * 1000).toPrecision(3)} µm`;

function positioningWarnings(
  input: PositioningInput,
  targets: number[],
  runsUp: number,
  runsDown: number,
  thermal: number,
): ResultWarning[] {
  const warnings: ResultWarning[] = [];
  const m = targets.length;
  if (runsUp < STANDARD_RUNS_PER_DIRECTION || runsDown < STANDARD_RUNS_PER_DIRECTION) {
    warnings.push({
      code: 'few-runs',
      message: `ISO 230-2 asks for ${STANDARD_RUNS_PER_DIRECTION} runs in each direction (got ${runsUp} up, ${runsDown} down); repeatability from fewer runs is less certain.`,
    });
  }
  const travelMm = targets[m - 1] - targets[0];
  const needed = targetsNeeded(travelMm);
  if (m < needed) {
    warnings.push({
      code: 'few-targets',
      message: `ISO 230-2 asks for at least ${STANDARD_MIN_TARGETS} targets and ${STANDARD_TARGETS_PER_METRE} per metre of travel: ${needed} over these ${travelMm.toFixed(1)} mm (got ${m}).`,
    });
  }
  const tolerance = input.toleranceMm == null ? null : requirePositive('tolerance', input.toleranceMm);
  const resolution =
    input.instrumentResolutionMm == null ? null : requirePositive('instrumentResolution', input.instrumentResolutionMm);
  if (tolerance !== null && resolution !== null && resolution > tolerance / 4) {
    warnings.push({
      code: 'coarse-instrument',
      message: `The instrument reads in steps of ${um(resolution)}, coarser than a quarter of the ${um(tolerance)} tolerance (${um(tolerance / 4)}); use a finer instrument for a result that can be trusted against this target.`,
    });
  }
  const thermalMax = Math.abs(travelMm * thermal);
  if (tolerance !== null && thermalMax > tolerance / 10) {
    warnings.push({
      code: 'thermal-correction',
      message: `Referred to 20 °C: the temperatures of the machine and the scale move the deviations by up to ${um(thermalMax)} over the run, more than a tenth of the ${um(tolerance)} tolerance; the figures shown are the referred ones.`,
    });
  }
  return warnings;
}
