/**
 * Ordinary least-squares straight lines, with the statistics a calibration record quotes.
 * Sums are taken about the means (two-pass), which keeps full double precision on data such as
 * stations of hundreds of millimetres carrying micrometre readings.
 */

export interface LineFit {
  slope: number;
  intercept: number;
  slopeStdDev: number;
  interceptStdDev: number;
  /** sqrt(RSS / (n − 2)); NaN for two points. */
  residualStdDev: number;
  residualSumSq: number;
  regressionSumSq: number;
  /** Centred coefficient of determination (1 − RSS/TSS about the mean). */
  rSquared: number;
}

export interface OriginLineFit {
  slope: number;
  slopeStdDev: number;
  residualStdDev: number;
  residualSumSq: number;
  regressionSumSq: number;
  /** Uncentred coefficient of determination (1 − RSS/Σy²), the convention for a fit through the origin. */
  rSquared: number;
}

function mean(values: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < values.length; i++) s += values[i];
  return s / values.length;
}

/** y = intercept + slope·x. Needs at least two distinct x; callers validate. */
export function fitLine(x: ArrayLike<number>, y: ArrayLike<number>): LineFit {
  const n = x.length;
  const mx = mean(x);
  const my = mean(y);
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i] - mx;
    const dy = y[i] - my;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  const slope = sxy / sxx;
  const intercept = my - slope * mx;
  // RSS summed from the residuals themselves rather than syy − slope·sxy, which cancels badly
  // when the fit is nearly perfect.
  let rss = 0;
  for (let i = 0; i < n; i++) {
    const r = y[i] - (slope * (x[i] - mx) + my);
    rss += r * r;
  }
  const dof = n - 2;
  const sigma2 = dof > 0 ? rss / dof : NaN;
  return {
    slope,
    intercept,
    slopeStdDev: Math.sqrt(sigma2 / sxx),
    interceptStdDev: Math.sqrt(sigma2 * (1 / n + (mx * mx) / sxx)),
    residualStdDev: Math.sqrt(sigma2),
    residualSumSq: rss,
    regressionSumSq: slope * slope * sxx,
    rSquared: syy > 0 ? 1 - rss / syy : 1,
  };
}

/** y = slope·x. Needs at least one non-zero x; callers validate. */
export function fitLineThroughOrigin(x: ArrayLike<number>, y: ArrayLike<number>): OriginLineFit {
  const n = x.length;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    sxx += x[i] * x[i];
    sxy += x[i] * y[i];
    syy += y[i] * y[i];
  }
  const slope = sxy / sxx;
  let rss = 0;
  for (let i = 0; i < n; i++) {
    const r = y[i] - slope * x[i];
    rss += r * r;
  }
  const dof = n - 1;
  const sigma2 = dof > 0 ? rss / dof : NaN;
  return {
    slope,
    slopeStdDev: Math.sqrt(sigma2 / sxx),
    residualStdDev: Math.sqrt(sigma2),
    residualSumSq: rss,
    regressionSumSq: slope * slope * sxx,
    rSquared: syy > 0 ? 1 - rss / syy : 1,
  };
}
