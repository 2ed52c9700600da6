import { EngineInputError } from './engine-input-error.js';
import type { GridPoint } from './flatness.js';

/**
 * Minimum-zone flatness (ISO 1101: the smallest distance between two parallel planes that hold
 * every point), with the zone measured along the height axis, as a gauge reads it. For the tilts a
 * bed has (under a few mm/m) the distance square to the planes is smaller by 1/√(1 + a² + b²),
 * which differs from 1 by under 5·10⁻⁶ at 3 mm/m, so the reading-axis width is the one reported.
 *
 * The zone is the Chebyshev (minimax) plane: minimise h subject to |z_i − (a·x_i + b·y_i + c)| ≤ h.
 * That linear programme has four unknowns and two constraints per point; its dual has one variable
 * per constraint and only four equality rows,
 *   maximise Σ z_i (u_i − v_i)  subject to  Σ (u_i − v_i)·(x_i, y_i, 1) = 0,  Σ (u_i + v_i) = 1,  u, v ≥ 0,
 * which a dense two-phase simplex on a 4-row tableau solves quickly even for thousands of points.
 * The plane comes back as the simplex multipliers; the width is then measured directly from the
 * residuals about it, so the reported zone always holds every point. Bland's rule keeps the
 * degenerate pivots of regular grids (many points at equal height) from cycling.
 */

export interface MinimumZonePlane {
  /** Slopes (mm per mm) and height at X0 Y0 (mm) of the zone's middle plane. */
  a: number;
  b: number;
  cMm: number;
  /** Zone width along the height axis, mm. */
  flatnessMm: number;
  /** Height minus middle plane, per point in input order (each within ± flatness / 2). */
  residualsMm: number[];
}

const EPS = 1e-11;
const MAX_PIVOTS = 200_000;

export function minimumZonePlane(points: readonly GridPoint[]): MinimumZonePlane {
  const n = points.length;
  if (n < 3) throw new EngineInputError(`points needs at least 3 values (got ${n})`, 'points');
  // Centre and scale every coordinate to about ±1 so the tableau is well conditioned.
  const mean = (f: (p: GridPoint) => number) => points.reduce((s, p) => s + f(p), 0) / n;
  const mx = mean((p) => p.xMm);
  const my = mean((p) => p.yMm);
  const mz = mean((p) => p.zMm);
  const spread = (f: (p: GridPoint) => number, m: number) => Math.max(...points.map((p) => Math.abs(f(p) - m))) || 1;
  const sx = spread((p) => p.xMm, mx);
  const sy = spread((p) => p.yMm, my);
  const sz = spread((p) => p.zMm, mz);
  const X = points.map((p) => (p.xMm - mx) / sx);
  const Y = points.map((p) => (p.yMm - my) / sy);
  const Z = points.map((p) => (p.zMm - mz) / sz);

  const pi = solveDual(X, Y, Z);
  // Multipliers π of the minimised dual are minus the primal unknowns (a, b, c, h), in scaled units.
  const aScaled = -pi[0];
  const bScaled = -pi[1];
  const a = (aScaled * sz) / sx;
  const b = (bScaled * sz) / sy;
  const plain = points.map((p) => p.zMm - a * p.xMm - b * p.yMm);
  const hi = Math.max(...plain);
  const lo = Math.min(...plain);
  const cMm = (hi + lo) / 2;
  return { a, b, cMm, flatnessMm: hi - lo, residualsMm: plain.map((r) => r - cMm) };
}

/** Two-phase simplex on the dual; returns the multipliers π of its four rows at the optimum. */
function solveDual(X: number[], Y: number[], Z: number[]): number[] {
  const n = X.length;
  const m = 4;
  const cols = 2 * n + m; // u_i, v_i, then four artificials
  const rhs = cols;
  const T: Float64Array[] = Array.from({ length: m }, () => new Float64Array(cols + 1));
  const cost = new Float64Array(cols);
  for (let i = 0; i < n; i++) {
    const u = 2 * i;
    const v = u + 1;
    T[0][u] = X[i];
    T[0][v] = -X[i];
    T[1][u] = Y[i];
    T[1][v] = -Y[i];
    T[2][u] = 1;
    T[2][v] = -1;
    T[3][u] = 1;
    T[3][v] = 1;
    cost[u] = -Z[i];
    cost[v] = Z[i];
  }
  for (let r = 0; r < m; r++) T[r][2 * n + r] = 1;
  T[3][rhs] = 1;
  const basis = [2 * n, 2 * n + 1, 2 * n + 2, 2 * n + 3];
  const isArtificial = (j: number) => j >= 2 * n;

  // Phase 1: minimise the sum of the artificials.
  const phase1 = new Float64Array(cols);
  for (let r = 0; r < m; r++) phase1[2 * n + r] = 1;
  run(T, basis, phase1, () => true);
  // Artificials still basic (at zero) are pivoted out on any real column of their row.
  for (let r = 0; r < m; r++) {
    if (!isArtificial(basis[r])) continue;
    let j = 0;
    while (j < 2 * n && Math.abs(T[r][j]) <= EPS) j++;
    if (j === 2 * n)
      throw new EngineInputError('points all lie on one line; a plane needs points spread in both x and y', 'points');
    pivot(T, basis, r, j);
  }
  // Phase 2: the dual objective, artificials never re-enter.
  run(T, basis, cost, (j) => !isArtificial(j));
  // π_k = c_Bᵀ B⁻¹ e_k, and B⁻¹ e_k is the artificial column k of the final tableau.
  const pi = new Array<number>(m).fill(0);
  for (let k = 0; k < m; k++) {
    let s = 0;
    for (let r = 0; r < m; r++) s += cost[basis[r]] * T[r][2 * n + k];
    pi[k] = s;
  }
  return pi;
}

function run(T: Float64Array[], basis: number[], cost: Float64Array, mayEnter: (j: number) => boolean): void {
  const m = T.length;
  const cols = cost.length;
  const rhs = cols;
  for (let step = 0; step < MAX_PIVOTS; step++) {
    // Bland's rule: the first column with a negative reduced cost enters.
    let enter = -1;
    for (let j = 0; j < cols && enter < 0; j++) {
      if (!mayEnter(j) || basis.includes(j)) continue;
      let d = cost[j];
      for (let r = 0; r < m; r++) d -= cost[basis[r]] * T[r][j];
      if (d < -EPS) enter = j;
    }
    if (enter < 0) return;
    let leave = -1;
    let best = Infinity;
    for (let r = 0; r < m; r++) {
      if (T[r][enter] <= EPS) continue;
      const ratio = T[r][rhs] / T[r][enter];
      if (ratio < best - EPS || (Math.abs(ratio - best) <= EPS && basis[r] < basis[leave])) {
        best = ratio;
        leave = r;
      }
    }
    // The dual is bounded (Σ(u + v) = 1), so a column with no positive entry cannot improve it.
    if (leave < 0)
      throw new EngineInputError('the heights give no bounded flatness zone; check the values entered', 'points');
    pivot(T, basis, leave, enter);
  }
  throw new EngineInputError('the flatness zone did not settle; check the values entered', 'points');
}

function pivot(T: Float64Array[], basis: number[], row: number, col: number): void {
  const pr = T[row];
  const p = pr[col];
  for (let j = 0; j < pr.length; j++) pr[j] /= p;
  for (let r = 0; r < T.length; r++) {
    if (r === row) continue;
    const f = T[r][col];
    if (f === 0) continue;
    const tr = T[r];
    for (let j = 0; j < tr.length; j++) tr[j] -= f * pr[j];
  }
  basis[row] = col;
}
