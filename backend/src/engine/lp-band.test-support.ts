import solver from 'javascript-lp-solver';

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
  } as any) as any;
  if (!result.feasible) throw new Error('LP band problem reported infeasible');
  return { width: 2 * (result.h ?? 0), slope: result.m ?? 0 };
}
