import lpSolverModule from 'javascript-lp-solver';

interface LpSolver {
  Solve(model: unknown): Record<string, number | boolean | undefined>;
}
// The package's typings describe its CommonJS face; under ESM the default export is the solver.
const solver: LpSolver = ((lpSolverModule as unknown as { default?: LpSolver }).default ?? lpSolverModule) as LpSolver;

/**
 * Independent minimum-zone check: the vertical minimax band solved as a linear programme by a
 * general-purpose LP package (javascript-lp-solver):
 *   minimise h  subject to  −h ≤ y_i − (m·x_i + c) ≤ h  for every point, m and c free.
 * The band width is 2h.
 */
export function lpBandWidth(x: readonly number[], y: readonly number[]): { width: number; slope: number } {
  const constraints: Record<string, { max?: number; min?: number }> = {};
  const m: Record<string, number> = {};
  const c: Record<string, number> = {};
  const h: Record<string, number> = { width: 1 };
  x.forEach((xi, i) => {
    constraints[`up${i}`] = { max: -y[i] };
    constraints[`dn${i}`] = { min: -y[i] };
    m[`up${i}`] = -xi;
    m[`dn${i}`] = -xi;
    c[`up${i}`] = -1;
    c[`dn${i}`] = -1;
    h[`up${i}`] = -1;
    h[`dn${i}`] = 1;
  });
  const result = solver.Solve({
    optimize: 'width',
    opType: 'min',
    constraints,
    variables: { m, c, h },
    unrestricted: { m: 1, c: 1 },
  });
  if (!result.feasible) throw new Error('LP band problem reported infeasible');
  return { width: 2 * Number(result.h ?? 0), slope: Number(result.m ?? 0) };
}
