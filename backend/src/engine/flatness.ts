import { EngineInputError } from './engine-input-error.js';
import { requireCount, requireFinite, requireFiniteResult } from './validate.js';

/**
 * Flatness of a bed grid: least-squares plane z = a·x + b·y + c through heights measured at
 * (x, y) points (all mm), flatness = max − min residual, and the plane's tilt.
 * The normal equations are solved about the centroid, which leaves a 2 × 2 system and keeps
 * precision for bed coordinates of metres carrying heights of hundredths.
 */

export interface GridPoint {
  xMm: number;
  yMm: number;
  zMm: number;
}

export interface FlatnessResult {
  /** Slope of the plane along x (mm/mm). */
  a: number;
  /** Slope of the plane along y (mm/mm). */
  b: number;
  /** Plane height at x = 0, y = 0. */
  cMm: number;
  flatnessMm: number;
  /** Height minus plane, per point in input order. */
  residualsMm: number[];
  tiltXMmPerMetre: number;
  tiltYMmPerMetre: number;
  /** Steepest slope of the plane, and the direction it rises towards (degrees from +x towards +y). */
  tiltMmPerMetre: number;
  tiltDirectionDeg: number;
}

export const MIN_FLATNESS_POINTS = 3;

// Relative size below which the x–y spread is treated as a line (the plane is then undefined).
const COLLINEAR_TOLERANCE = 1e-12;

export function evaluateFlatness(points: readonly GridPoint[]): FlatnessResult {
  if (!Array.isArray(points)) throw new EngineInputError('points must be a list of {x, y, z}', 'points');
  requireCount('points', points.length, MIN_FLATNESS_POINTS);
  const n = points.length;
  const seen = new Map<string, number>();
  let mx = 0;
  let my = 0;
  let mz = 0;
  points.forEach((p, i) => {
    if (p === null || typeof p !== 'object') throw new EngineInputError(`points[${i}] must be {x, y, z}`, 'points');
    requireFinite(`points[${i}].x`, p.xMm);
    requireFinite(`points[${i}].y`, p.yMm);
    requireFinite(`points[${i}].z`, p.zMm);
    const key = `${p.xMm},${p.yMm}`;
    const earlier = seen.get(key);
    if (earlier !== undefined) {
      throw new EngineInputError(
        `points[${earlier}] and points[${i}] are at the same position (${p.xMm}, ${p.yMm})`,
        'points',
      );
    }
    seen.set(key, i);
    mx += p.xMm;
    my += p.yMm;
    mz += p.zMm;
  });
  mx /= n;
  my /= n;
  mz /= n;

  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  let sxz = 0;
  let syz = 0;
  for (const p of points) {
    const dx = p.xMm - mx;
    const dy = p.yMm - my;
    const dz = p.zMm - mz;
    sxx += dx * dx;
    syy += dy * dy;
    sxy += dx * dy;
    sxz += dx * dz;
    syz += dy * dz;
  }
  const det = sxx * syy - sxy * sxy;
  if (!(det > COLLINEAR_TOLERANCE * Math.max(sxx * syy, Number.MIN_VALUE))) {
    throw new EngineInputError('points all lie on one line; a plane needs points spread in both x and y', 'points');
  }
  const a = (sxz * syy - syz * sxy) / det;
  const b = (syz * sxx - sxz * sxy) / det;
  const c = mz - a * mx - b * my;

  const residuals = new Array<number>(n);
  let min = Infinity;
  let max = -Infinity;
  points.forEach((p, i) => {
    const r = p.zMm - (a * (p.xMm - mx) + b * (p.yMm - my) + mz);
    residuals[i] = r;
    if (r < min) min = r;
    if (r > max) max = r;
  });

  return requireFiniteResult('points', {
    a,
    b,
    cMm: c,
    flatnessMm: max - min,
    residualsMm: residuals,
    tiltXMmPerMetre: a * 1000,
    tiltYMmPerMetre: b * 1000,
    tiltMmPerMetre: Math.hypot(a, b) * 1000,
    tiltDirectionDeg: (Math.atan2(b, a) * 180) / Math.PI,
  });
}
