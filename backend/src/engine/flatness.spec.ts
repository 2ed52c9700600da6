import { Matrix, solve } from 'ml-matrix';
import { evaluateFlatness, type GridPoint } from './flatness.js';
import { expectRelative } from './relative.test-support.js';
import { seededRandom } from './seeded-random.js';

function grid(nx: number, ny: number, stepMm: number, z: (x: number, y: number) => number): GridPoint[] {
  const pts: GridPoint[] = [];
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) pts.push({ xMm: i * stepMm, yMm: j * stepMm, zMm: z(i * stepMm, j * stepMm) });
  }
  return pts;
}

describe('flatness', () => {
  // Independent check: the same normal equations XᵀX β = Xᵀz solved by a general-purpose
  // matrix library from npm (ml-matrix), on random bed grids.
  it('agrees with the normal equations solved by ml-matrix', () => {
    const rand = seededRandom(77);
    for (let trial = 0; trial < 30; trial++) {
      const n = 3 + Math.floor(rand() * 80);
      const pts: GridPoint[] = Array.from({ length: n }, (_, i) => ({
        xMm: i * 37 + rand() * 30,
        yMm: rand() * 1500,
        zMm: 0.0004 * i - 0.00002 * rand() * 1500 + (rand() - 0.5) * 0.2,
      }));
      const X = new Matrix(pts.map((p) => [p.xMm, p.yMm, 1]));
      const z = Matrix.columnVector(pts.map((p) => p.zMm));
      const beta = solve(X.transpose().mmul(X), X.transpose().mmul(z));
      const r = evaluateFlatness(pts);
      expectRelative(r.a, beta.get(0, 0), 1e-7);
      expectRelative(r.b, beta.get(1, 0), 1e-7);
      expect(r.cMm).toBeCloseTo(beta.get(2, 0), 8);
      const residuals = pts.map((p) => p.zMm - (beta.get(0, 0) * p.xMm + beta.get(1, 0) * p.yMm + beta.get(2, 0)));
      expect(r.flatnessMm).toBeCloseTo(Math.max(...residuals) - Math.min(...residuals), 8);
    }
  });

  it('gives zero flatness and the exact tilt for a tilted plane (worked by hand)', () => {
    // Rises 0.3 mm per metre along x and falls 0.4 mm per metre along y: overall 0.5 mm/m.
    const r = evaluateFlatness(grid(5, 4, 250, (x, y) => 0.0003 * x - 0.0004 * y + 2));
    expect(r.flatnessMm).toBeCloseTo(0, 12);
    expect(r.tiltXMmPerMetre).toBeCloseTo(0.3, 12);
    expect(r.tiltYMmPerMetre).toBeCloseTo(-0.4, 12);
    expect(r.tiltMmPerMetre).toBeCloseTo(0.5, 12);
    expect(r.tiltDirectionDeg).toBeCloseTo((Math.atan2(-4, 3) * 180) / Math.PI, 10);
    expect(r.cMm).toBeCloseTo(2, 12);
  });

  it('measures a single high point against the plane of the others (worked by hand)', () => {
    // 3 × 3 grid, flat except the centre 0.09 mm high: the LS plane is z = 0.01,
    // residuals −0.01 at eight points and +0.08 at the centre, flatness 0.09.
    const r = evaluateFlatness(grid(3, 3, 100, (x, y) => (x === 100 && y === 100 ? 0.09 : 0)));
    expect(r.cMm).toBeCloseTo(0.01, 14);
    expect(r.flatnessMm).toBeCloseTo(0.09, 14);
  });

  it('names the problem on bad input', () => {
    expect(() =>
      evaluateFlatness([
        { xMm: 0, yMm: 0, zMm: 0 },
        { xMm: 1, yMm: 0, zMm: 0 },
      ]),
    ).toThrow('points needs at least 3 values (got 2)');
    expect(() => evaluateFlatness(grid(4, 1, 10, () => 0))).toThrow(/points all lie on one line/);
    expect(() =>
      evaluateFlatness([
        { xMm: 0, yMm: 0, zMm: 0 },
        { xMm: 1, yMm: 0, zMm: 0 },
        { xMm: 0, yMm: 1, zMm: NaN },
      ]),
    ).toThrow('points[2].z must be a finite number');
    expect(() =>
      evaluateFlatness([
        { xMm: 0, yMm: 0, zMm: 0 },
        { xMm: 1, yMm: 0, zMm: 0 },
        { xMm: 0, yMm: 0, zMm: 1 },
      ]),
    ).toThrow('points[0] and points[2] are at the same position (0, 0)');
  });
});
