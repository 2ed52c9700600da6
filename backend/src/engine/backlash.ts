import { EngineInputError } from './engine-input-error.js';
import { requireFinite, requireFiniteResult, requireNumberArray } from './validate.js';
import type { ResultWarning } from './warnings.js';

/**
 * Backlash of an axis from an indicator held against the moving part.
 *
 * At each position the axis is brought to the same commanded coordinate several times moving in
 * the positive direction ("up") and several times moving in the negative direction ("down"), and
 * the indicator is read each time. The backlash at that position is
 *
 *     b_i = | mean(readings up) − mean(readings down) |
 *
 * which is ISO 230-2's reversal value B_i = x̄_i↑ − x̄_i↓ for one target, taken as a size. The
 * axis's backlash is the largest b_i (TRADE.md, common practice: "at the middle and both ends;
 * report the largest"; ISO 230-2's B = max |B_i| is the same rule).
 *
 * Millimetres in, millimetres out.
 */

/** Fewer approaches a side than this gives a mean that one bad reading moves too far (TRADE.md: 3+ runs). */
export const MIN_APPROACHES = 3;

export interface BacklashPositionInput {
  positionMm: number;
  /** Indicator readings after approaching while moving in the positive direction, mm. */
  upMm: number[];
  /** Indicator readings after approaching while moving in the negative direction, mm. */
  downMm: number[];
}

export interface BacklashInput {
  positions: BacklashPositionInput[];
  /** Smallest step the indicator shows, mm; optional. */
  resolutionMm?: number | null;
  /** The reversal target, mm; with the resolution it decides the coarse-instrument warning. */
  targetMm?: number | null;
}

export interface BacklashAtPosition {
  positionMm: number;
  meanUpMm: number;
  meanDownMm: number;
  /** Signed mean(up) − mean(down), mm (ISO 230-2's B_i). */
  reversalMm: number;
  /** |reversalMm|, mm. */
  backlashMm: number;
  /** Range of the readings on each side, mm: scatter that the mean smooths over. */
  rangeUpMm: number;
  rangeDownMm: number;
  approachesUp: number;
  approachesDown: number;
}

export interface BacklashResult {
  positions: BacklashAtPosition[];
  /** The largest backlash over the positions, mm. */
  backlashMm: number;
  /** Where the largest backlash was read, mm. */
  worstPositionMm: number;
  /** Mean of the per-position backlash values, mm. */
  meanBacklashMm: number;
  warnings: ResultWarning[];
}

const mean = (v: number[]) => v.reduce((s, x) => s + x, 0) / v.length;
const range = (v: number[]) => Math.max(...v) - Math.min(...v);
const um = (mm: number) => `${(mm * 1000).toFixed(1)} µm`;

export function evaluateBacklash(input: BacklashInput): BacklashResult {
  if (!Array.isArray(input.positions) || input.positions.length === 0)
    throw new EngineInputError('positions must hold at least one position', 'positions');
  const positions = input.positions.map((p, i): BacklashAtPosition => {
    const positionMm = requireFinite(`positions[${i}].position`, p.positionMm);
    const up = requireNumberArray(`positions[${i}].up`, p.upMm, 1, 1000);
    const down = requireNumberArray(`positions[${i}].down`, p.downMm, 1, 1000);
    const meanUpMm = mean(up);
    const meanDownMm = mean(down);
    const reversalMm = meanUpMm - meanDownMm;
    return {
      positionMm,
      meanUpMm,
      meanDownMm,
      reversalMm,
      backlashMm: Math.abs(reversalMm),
      rangeUpMm: range(up),
      rangeDownMm: range(down),
      approachesUp: up.length,
      approachesDown: down.length,
    };
  });
  const worst = positions.reduce((a, b) => (b.backlashMm > a.backlashMm ? b : a));
  return requireFiniteResult('positions', {
    positions,
    backlashMm: worst.backlashMm,
    worstPositionMm: worst.positionMm,
    meanBacklashMm: mean(positions.map((p) => p.backlashMm)),
    warnings: backlashWarnings(positions, input.resolutionMm ?? null, input.targetMm ?? null),
  });
}

/** The warnings of a result, read again against the target in force (it may have changed since). */
export function backlashWarnings(
  positions: BacklashAtPosition[],
  resolutionMm: number | null,
  targetMm: number | null,
): ResultWarning[] {
  const out: ResultWarning[] = [];
  const few = positions.filter((p) => Math.min(p.approachesUp, p.approachesDown) < MIN_APPROACHES);
  if (few.length) {
    out.push({
      code: 'few-approaches',
      message: `Fewer than ${MIN_APPROACHES} approaches from a side at ${few.map((p) => `${p.positionMm} mm`).join(', ')}: one stray reading moves the mean, so take ${MIN_APPROACHES} or more from each side.`,
    });
  }
  if (resolutionMm !== null && targetMm !== null && targetMm > 0 && resolutionMm > targetMm / 4) {
    out.push({
      code: 'coarse-instrument',
      message: `The indicator reads in steps of ${um(resolutionMm)}, coarser than a quarter of the ${um(targetMm)} target (${um(targetMm / 4)}): use a finer indicator to judge this result.`,
    });
  }
  // Scatter on one side as large as the backlash itself means the mean difference is mostly
  // noise: a loose coupler, a sliding indicator base or repeatability, not play to take up.
  const noisy = positions.filter((p) => p.backlashMm > 0 && Math.max(p.rangeUpMm, p.rangeDownMm) > p.backlashMm);
  if (noisy.length) {
    out.push({
      code: 'scatter-above-backlash',
      message: `At ${noisy.map((p) => `${p.positionMm} mm (spread ${um(Math.max(p.rangeUpMm, p.rangeDownMm))}, backlash ${um(p.backlashMm)})`).join(', ')} the readings from one side spread more than the backlash: check the indicator's base and the couplers before trusting the value.`,
    });
  }
  return out;
}
