import lpSolverModule from 'javascript-lp-solver';
import { evaluateFlatness, type GridPoint } from './flatness.js';
import { minimumZonePlane } from './flatness-zone.js';
import { seededRandom } from './seeded-random.js';

interface LpSolver {
  Solve(model: unknown): Record<string, number | boolean | undefined>;
}
const solver: LpSolver = ((lpSolverModule as unknown as { default?: LpSolver }).default ?? lpSolverModule) as LpSolver;

/**
 * Independent reference: the minimax plane as a linear programme solved by a general-purpose LP
 * package (javascript-lp-solver): minimise h subject to −h ≤ z_i − (a·x_i + b·y_i + c) ≤ h. The zone
 * width (ISO 1101: the distance between two parallel planes holding every point, along the height
 * axis) is 2h. The free unknowns a, b, c are each written as the difference of two non-negative
 * ones (the package's own "unrestricted" option returned infeasible points on small cases);
 * positions in metres keep the LP's tolerances meaningful.
 */
function lpZoneWidth(points: GridPoint[]): number {
  const constraints: Record<string, { max?: number; min?: number }> = {};
  const vars: Record<string, Record<string, number>> = {
    h: { width: 1 },
    ap: {},
    an: {},
    bp: {},
    bn: {},
    cp: {},
    cn: {},
  };
  points.forEach((p, i) => {
    constraints[`up${i}`] = { max: -p.zMm };
    constraints[`dn${i}`] = { min: -p.zMm };
    const coef = { a: -p.xMm / 1000, b: -p.yMm / 1000, c: -1 };
    for (const k of ['a', 'b', 'c'] as const) {
      for (const row of [`up${i}`, `dn${i}`]) {
        vars[`${k}p`][row] = coef[k];
        vars[`${k}n`][row] = -coef[k];
      }
    }
    vars.h[`up${i}`] = -1;
    vars.h[`dn${i}`] = 1;
  });
  const result = solver.Solve({ optimize: 'width', opType: 'min', constraints, variables: vars });
  if (!result.feasible) throw new Error('LP reported infeasible');
  return 2 * Number(result.h ?? 0);
}

function grid(nx: number, ny: number, step: number, z: (x: number, y: number) => number): GridPoint[] {
  const out: GridPoint[] = [];
  for (let j = 0; j < ny; j++)
    for (let i = 0; i < nx; i++) out.push({ xMm: i * step, yMm: j * step, zMm: z(i * step, j * step) });
  return out;
}

describe('minimum-zone flatness', () => {
  // javascript-lp-solver as the independent reference, on random beds (tilted, warped, noisy).
  it('matches the LP minimax plane solved by javascript-lp-solver', () => {
    const rand = seededRandom(1101);
    for (let trial = 0; trial < 40; trial++) {
      const nx = 2 + Math.floor(rand() * 6);
      const ny = 2 + Math.floor(rand() * 6);
      const tiltX = (rand() - 0.5) * 0.002;
      const tiltY = (rand() - 0.5) * 0.002;
      const warp = rand() * 0.3;
      const pts = grid(
        nx,
        ny,
        250,
        (x, y) => tiltX * x + tiltY * y + warp * Math.sin(x / 400) * Math.cos(y / 300) + (rand() - 0.5) * 0.1,
      );
      const r = minimumZonePlane(pts);
      expect(r.flatnessMm).toBeCloseTo(lpZoneWidth(pts), 7);
      // The zone holds every point, and is never wider than least squares' (the minimum is a minimum).
      r.residualsMm.forEach((res) => expect(Math.abs(res)).toBeLessThanOrEqual(r.flatnessMm / 2 + 1e-12));
      expect(r.flatnessMm).toBeLessThanOrEqual(evaluateFlatness(pts).flatnessMm + 1e-12);
    }
  });

  it('matches the LP on scattered (not gridded) points with repeated heights', () => {
    const rand = seededRandom(9013);
    for (let trial = 0; trial < 15; trial++) {
      const pts: GridPoint[] = Array.from({ length: 5 + Math.floor(rand() * 60) }, (_, i) => ({
        xMm: rand() * 3000,
        yMm: rand() * 1500 + i * 1e-3,
        zMm: Math.round(rand() * 8) * 0.05,
      }));
      expect(minimumZonePlane(pts).flatnessMm).toBeCloseTo(lpZoneWidth(pts), 7);
    }
  });

  // Worked by hand (ISO 1101 definition): a plane, however tilted, lies in a zone of width 0.
  it('gives zero for a tilted plane and recovers its slopes', () => {
    const r = minimumZonePlane(grid(5, 4, 300, (x, y) => 0.0004 * x - 0.0002 * y + 1.5));
    expect(r.flatnessMm).toBeCloseTo(0, 12);
    expect(r.a).toBeCloseTo(0.0004, 12);
    expect(r.b).toBeCloseTo(-0.0002, 12);
  });

  // Worked by hand: a 3 × 3 grid flat but for a centre bump h. Least squares gives h (residuals
  // 8h/9 and −h/9); the minimum zone is also h, since no tilt can lower a centre bump relative to
  // a symmetric ring. A 2 × 2 grid with one corner raised by h has the twist
  // z00 − z10 − z01 + z11 = h, which no plane can take out: the best leaves ±h/4 at the corners,
  // a zone of h/2.
  it('agrees with hand-worked bumps', () => {
    expect(minimumZonePlane(grid(3, 3, 100, (x, y) => (x === 100 && y === 100 ? 0.09 : 0))).flatnessMm).toBeCloseTo(
      0.09,
      12,
    );
    const corner = grid(2, 2, 100, (x, y) => (x === 0 && y === 0 ? 0.2 : 0));
    expect(minimumZonePlane(corner).flatnessMm).toBeCloseTo(0.1, 12);
    expect(lpZoneWidth(corner)).toBeCloseTo(0.1, 9);
  });

  it('refuses points on one line', () => {
    expect(() => minimumZonePlane(grid(4, 1, 10, () => 0))).toThrow(/one line/);
  });

  it('solves a 50 × 50 grid (the largest a bed grid accepts)', () => {
    const rand = seededRandom(5);
    const pts = grid(50, 50, 60, (x, y) => 0.0001 * x + 0.2 * Math.sin(x / 500 + y / 700) + (rand() - 0.5) * 0.02);
    const r = minimumZonePlane(pts);
    r.residualsMm.forEach((res) => expect(Math.abs(res)).toBeLessThanOrEqual(r.flatnessMm / 2 + 1e-12));
    expect(r.flatnessMm).toBeLessThanOrEqual(evaluateFlatness(pts).flatnessMm);
  });
});
