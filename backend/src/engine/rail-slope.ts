import { EngineInputError } from './engine-input-error.js';
import { requireNumberArray, requireSameLength, requireFiniteResult } from './validate.js';

/**
 * Local slope along a rail: how steeply the deviation from the reference line changes between
 * two stations, in mm per metre (rise over run × 1000). Without a base it is the largest slope
 * between neighbouring stations; with a base, between each station and the first station at
 * least `baseMm` further on. Residuals from the judged reference line are used, so the set-up
 * tilt of the indicator does not count as slope.
 */
export interface LocalSlopeResult {
  mmPerM: number;
  /** The two stations of the steepest stretch, mm along the rail. */
  fromMm: number;
  toMm: number;
  baseMm: number | null;
}

export function localSlope(
  positionsMm: readonly number[],
  deviationsMm: readonly number[],
  baseMm: number | null = null,
): LocalSlopeResult {
  const x = requireNumberArray('positions', positionsMm, 2);
  const y = requireNumberArray('deviations', deviationsMm, 2);
  requireSameLength('positions', x, 'deviations', y);
  if (baseMm !== null && !(Number.isFinite(baseMm) && baseMm > 0))
    throw new EngineInputError('base must be a positive length', 'base');
  const order = x.map((_, i) => i).sort((i, j) => x[i] - x[j]);
  let best: LocalSlopeResult = { mmPerM: 0, fromMm: x[order[0]], toMm: x[order[1]], baseMm };
  let j = 0;
  for (let k = 0; k < order.length - 1; k++) {
    const i = order[k];
    let next = k + 1;
    if (baseMm !== null) {
      j = Math.max(j, k + 1);
      while (j < order.length && x[order[j]] - x[i] < baseMm) j++;
      if (j === order.length) break;
      next = j;
    }
    const n = order[next];
    const run = x[n] - x[i];
    if (run <= 0) continue;
    const slope = (Math.abs(y[n] - y[i]) / run) * 1000;
    if (slope > best.mmPerM) best = { mmPerM: slope, fromMm: x[i], toMm: x[n], baseMm };
  }
  return requireFiniteResult('deviations', best);
}
