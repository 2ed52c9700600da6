/**
 * Exact minimum-zone straightness: the narrowest band between two parallel lines that holds every
 * point, its width measured along the reading axis (vertically), as indicator readings are taken.
 *
 * For a slope m the band width is w(m) = max(y − m·x) − min(y − m·x). The maximum is attained on
 * the upper convex hull, the minimum on the lower hull, and w is convex and piecewise linear with
 * its breakpoints at the hull edge slopes, so the optimum lies at one of those slopes: one band line
 * carries a hull edge, the other touches the antipodal vertex of the opposite hull. Both antipodal
 * vertices move monotonically as the slope increases (rotating calipers), so after the hull the
 * search is linear; the hull is linear on ascending stations and n log n otherwise.
 */

export interface MinimumZoneLine {
  /** Slope of the band's centre line (reading units per position unit). */
  slope: number;
  /** Intercept of the centre line; the band is centre ± width / 2. */
  intercept: number;
  /** Band width along the reading axis. */
  width: number;
}

/**
 * Builds upper and lower hulls (Andrew's monotone chain) of points taken in ascending x.
 * `order` maps rank to input index (null: input already ascending). Coordinates are shifted to the
 * first point so cross products stay well conditioned for large station values.
 */
function hulls(x: ArrayLike<number>, y: ArrayLike<number>, order: Uint32Array | null) {
  const n = x.length;
  const at = (k: number) => (order ? order[k] : k);
  const x0 = x[at(0)];
  const y0 = y[at(0)];
  const px = new Float64Array(n);
  const py = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    px[k] = x[at(k)] - x0;
    py[k] = y[at(k)] - y0;
  }
  const upper = new Int32Array(n);
  const lower = new Int32Array(n);
  let nu = 0;
  let nl = 0;
  for (let k = 0; k < n; k++) {
    // Upper hull keeps clockwise turns; collinear middle points are dropped from both hulls.
    while (nu >= 2) {
      const a = upper[nu - 2];
      const b = upper[nu - 1];
      const cross = (px[b] - px[a]) * (py[k] - py[a]) - (py[b] - py[a]) * (px[k] - px[a]);
      if (cross >= 0) nu--;
      else break;
    }
    upper[nu++] = k;
    while (nl >= 2) {
      const a = lower[nl - 2];
      const b = lower[nl - 1];
      const cross = (px[b] - px[a]) * (py[k] - py[a]) - (py[b] - py[a]) * (px[k] - px[a]);
      if (cross <= 0) nl--;
      else break;
    }
    lower[nl++] = k;
  }
  return { px, py, upper: upper.subarray(0, nu), lower: lower.subarray(0, nl), x0, y0 };
}

/**
 * Minimum-zone band of points with distinct x (at least two). `order` is the ascending order of x
 * as returned by ascendingOrder(), or null when x is already ascending.
 */
export function minimumZoneLine(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  order: Uint32Array | null,
): MinimumZoneLine {
  const { px, py, upper, lower, x0, y0 } = hulls(x, y, order);
  const nu = upper.length;
  const nl = lower.length;
  // Edge slopes: decreasing along the upper hull, increasing along the lower hull.
  const su = new Float64Array(nu - 1);
  for (let k = 0; k < nu - 1; k++) {
    su[k] = (py[upper[k + 1]] - py[upper[k]]) / (px[upper[k + 1]] - px[upper[k]]);
  }
  const sl = new Float64Array(nl - 1);
  for (let k = 0; k < nl - 1; k++) {
    sl[k] = (py[lower[k + 1]] - py[lower[k]]) / (px[lower[k + 1]] - px[lower[k]]);
  }

  let best = { slope: 0, hi: Infinity, lo: -Infinity, width: Infinity };
  const consider = (m: number, ui: number, li: number) => {
    const hi = py[ui] - m * px[ui];
    const lo = py[li] - m * px[li];
    if (hi - lo < best.width) best = { slope: m, hi, lo, width: hi - lo };
  };

  // Slopes of upper edges in increasing order (right to left); the lowest point of the lower hull
  // relative to slope m moves right as m grows.
  let j = 0;
  for (let k = nu - 2; k >= 0; k--) {
    const m = su[k];
    while (j < nl - 1 && sl[j] < m) j++;
    consider(m, upper[k], lower[j]);
  }
  // Slopes of lower edges in increasing order; the highest point of the upper hull relative to
  // slope m moves left as m grows.
  let i = nu - 1;
  for (let k = 0; k < nl - 1; k++) {
    const m = sl[k];
    while (i > 0 && su[i - 1] < m) i--;
    consider(m, upper[i], lower[k]);
  }

  // Back to the caller's coordinates: y − y0 = m·(x − x0) + c  ⇒  intercept = y0 + c − m·x0.
  const centre = (best.hi + best.lo) / 2;
  return {
    slope: best.slope,
    intercept: y0 + centre - best.slope * x0,
    width: best.width,
  };
}
