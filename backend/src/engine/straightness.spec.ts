import { EngineInputError } from './engine-input-error.js';
import { lpBandWidth } from './lp-band.test-support.js';
import { referenceCsv, referenceJson } from './reference-data/reference-data.js';
import { randomRailSweep, seededRandom } from './seeded-random.js';
import { evaluateStraightness, leastSquaresStraightness, minimumZoneStraightness } from './straightness.js';
import { arrayToMm } from './units.js';

function caseRows(name: string) {
  const rows = referenceCsv('straightness_examples.csv').filter((r) => r.case === name);
  return { x: rows.map((r) => Number(r.x)), y: rows.map((r) => Number(r.y)) };
}

/** Exhaustive reference: the vertical minimum zone's slope is the slope through two of the points. */
function bruteForceZone(x: number[], y: number[]): number {
  let best = Infinity;
  for (let i = 0; i < x.length; i++) {
    for (let j = i + 1; j < x.length; j++) {
      const m = (y[j] - y[i]) / (x[j] - x[i]);
      let lo = Infinity;
      let hi = -Infinity;
      for (let k = 0; k < x.length; k++) {
        const d = y[k] - m * x[k];
        lo = Math.min(lo, d);
        hi = Math.max(hi, d);
      }
      best = Math.min(best, hi - lo);
    }
  }
  return best;
}

describe('straightness', () => {
  // Constructed example S1 (exact rational values, cross-checked there by an LP minimax fit):
  // a rail read with a dial indicator, stations in mm, readings in µm.
  it('matches the constructed rail set S1 (LS 81/11 µm, minimum zone 27/4 µm, end-point 73/10 µm)', () => {
    const expected = referenceJson('straightness_examples_expected.json').results.S1_rail_dial_indicator;
    expect(expected.minzone_slope).toBe('7/800');
    const { x, y } = caseRows('S1_rail_dial_indicator');
    const r = evaluateStraightness({ positionsMm: x, readingsMm: arrayToMm(y, 'um') });
    expect(r.leastSquares.straightnessMm).toBeCloseTo(81 / 11 / 1000, 14);
    expect(r.minimumZone.straightnessMm).toBeCloseTo(27 / 4 / 1000, 14);
    expect(r.endPoint.straightnessMm).toBeCloseTo(73 / 10 / 1000, 14);
    expect(r.leastSquares.slope).toBeCloseTo(17 / 2200 / 1000, 16);
    expect(r.leastSquares.interceptMm).toBeCloseTo(3.5 / 1000, 14);
    expect(r.minimumZone.slope).toBeCloseTo(7 / 800 / 1000, 16);
    expect(r.endPoint.slope).toBeCloseTo(11 / 1000 / 1000, 16);
  });

  // Constructed example S2, checkable by hand: LS line y = 0.8x − 0.8, residuals 0.8, 0, −0.8, −1.6, 1.6.
  it('matches the hand-checkable set S2 (LS 3.2, minimum zone 3, end-point 3)', () => {
    const { x, y } = caseRows('S2_hand_checkable');
    const r = evaluateStraightness({ positionsMm: x, readingsMm: y });
    expect(r.leastSquares.slope).toBeCloseTo(0.8, 14);
    expect(r.leastSquares.interceptMm).toBeCloseTo(-0.8, 14);
    [0.8, 0, -0.8, -1.6, 1.6].forEach((v, i) => expect(r.leastSquares.residualsMm[i]).toBeCloseTo(v, 14));
    expect(r.leastSquares.straightnessMm).toBeCloseTo(3.2, 14);
    expect(r.minimumZone.straightnessMm).toBeCloseTo(3, 14);
    expect(r.minimumZone.slope).toBeCloseTo(1, 14);
    expect(r.endPoint.straightnessMm).toBeCloseTo(3, 14);
    // Minimum-zone residuals are about the band's centre line: they span ±width/2.
    expect(Math.max(...r.minimumZone.residualsMm)).toBeCloseTo(1.5, 14);
    expect(Math.min(...r.minimumZone.residualsMm)).toBeCloseTo(-1.5, 14);
  });

  // Property of the definition (common practice): the minimum zone is the narrowest band, so it is
  // never wider than the band about the least-squares or the end-point line.
  it('never gives a minimum zone wider than least squares or the end-point line on random sets', () => {
    const rand = seededRandom(11);
    for (let trial = 0; trial < 400; trial++) {
      const n = 3 + Math.floor(rand() * 60);
      const x = Array.from({ length: n }, (_, i) => i * 50 + rand() * 40);
      const y = x.map(() => (rand() - 0.5) * 0.05);
      const r = evaluateStraightness({ positionsMm: x, readingsMm: y });
      const slack = 1e-12;
      expect(r.minimumZone.straightnessMm).toBeLessThanOrEqual(r.leastSquares.straightnessMm + slack);
      expect(r.minimumZone.straightnessMm).toBeLessThanOrEqual(r.endPoint.straightnessMm + slack);
    }
  });

  // Independent check: the same minimax band solved by a general-purpose LP package from npm.
  it('agrees with a linear-programming solution of the band problem (javascript-lp-solver)', () => {
    const rand = seededRandom(23);
    for (let trial = 0; trial < 40; trial++) {
      const n = 4 + Math.floor(rand() * 40);
      const x = Array.from({ length: n }, (_, i) => i * 2 + rand());
      const y = x.map((xi) => 0.03 * xi + (rand() - 0.5) * 2);
      const lp = lpBandWidth(x, y);
      const r = minimumZoneStraightness({ positionsMm: x, readingsMm: y });
      expect(r.straightnessMm).toBeCloseTo(lp.width, 7);
    }
  });

  // Independent check: exhaustive search over every point-pair slope (the optimum slope is one of them).
  it('agrees with an exhaustive point-pair search, including shuffled station order', () => {
    const rand = seededRandom(5);
    for (let trial = 0; trial < 100; trial++) {
      const n = 3 + Math.floor(rand() * 30);
      const x = Array.from({ length: n }, (_, i) => i * 25 + rand() * 20);
      const y = x.map(() => Math.round((rand() - 0.5) * 40) / 1000);
      for (let i = n - 1; i > 0; i--) {
        const j = Math.floor(rand() * (i + 1));
        [x[i], x[j]] = [x[j], x[i]];
        [y[i], y[j]] = [y[j], y[i]];
      }
      expect(minimumZoneStraightness({ positionsMm: x, readingsMm: y }).straightnessMm).toBeCloseTo(
        bruteForceZone(x, y),
        12,
      );
    }
  });

  it('reports residuals in the order the stations were given', () => {
    const x = [0, 100, 200, 300, 400];
    const y = [0, 0.01, -0.004, 0.006, 0.002];
    const sorted = evaluateStraightness({ positionsMm: x, readingsMm: y });
    const perm = [3, 0, 4, 1, 2];
    const shuffled = evaluateStraightness({ positionsMm: perm.map((i) => x[i]), readingsMm: perm.map((i) => y[i]) });
    for (const key of ['leastSquares', 'minimumZone', 'endPoint'] as const) {
      expect(shuffled[key].straightnessMm).toBeCloseTo(sorted[key].straightnessMm, 15);
      perm.forEach((i, k) => expect(shuffled[key].residualsMm[k]).toBeCloseTo(sorted[key].residualsMm[i], 15));
    }
  });

  // Common practice: tilting the indicator's reference (adding a linear trend) must not change straightness.
  it('is unchanged by a tilt of the reference', () => {
    const { positionsMm, readingsMm } = randomRailSweep(500, 3);
    const tilted = readingsMm.map((v, i) => v + 0.0002 * positionsMm[i] - 0.05);
    const a = evaluateStraightness({ positionsMm, readingsMm });
    const b = evaluateStraightness({ positionsMm, readingsMm: tilted });
    expect(b.leastSquares.straightnessMm).toBeCloseTo(a.leastSquares.straightnessMm, 10);
    expect(b.minimumZone.straightnessMm).toBeCloseTo(a.minimumZone.straightnessMm, 10);
    expect(b.endPoint.straightnessMm).toBeCloseTo(a.endPoint.straightnessMm, 10);
  });

  it('gives zero for readings on a straight line, including only three stations', () => {
    const r = evaluateStraightness({ positionsMm: [0, 500, 1000], readingsMm: [0.01, 0.02, 0.03] });
    expect(r.leastSquares.straightnessMm).toBeCloseTo(0, 15);
    expect(r.minimumZone.straightnessMm).toBeCloseTo(0, 15);
    expect(r.endPoint.straightnessMm).toBeCloseTo(0, 15);
  });

  describe('input checks', () => {
    const bad = (positionsMm: unknown, readingsMm: unknown) => () =>
      leastSquaresStraightness({ positionsMm, readingsMm } as never);

    it('needs at least three stations', () => {
      expect(bad([0, 1], [0, 1])).toThrow(EngineInputError);
      expect(bad([0, 1], [0, 1])).toThrow(/positions needs at least 3 values \(got 2\)/);
    });
    it('needs as many readings as positions', () => {
      expect(bad([0, 1, 2], [0, 1])).toThrow(/positions and readings must have the same length \(3 and 2\)/);
    });
    it('refuses non-finite numbers, naming the entry', () => {
      expect(bad([0, 1, 2], [0, NaN, 1])).toThrow(/readings\[1\] must be a finite number/);
      expect(bad([0, Infinity, 2], [0, 0, 1])).toThrow(/positions\[1\] must be a finite number/);
      expect(bad([0, '1', 2], [0, 0, 1])).toThrow(/positions\[1\] must be a finite number/);
    });
    it('refuses a repeated station', () => {
      expect(bad([0, 100, 50, 100], [0, 0, 1, 2])).toThrow(
        /positions repeats the value 100 \(at positions\[1\] and positions\[3\]\)/,
      );
    });
    it('refuses more than 200 000 stations', () => {
      const many = Array.from({ length: 200_001 }, (_, i) => i);
      expect(bad(many, many)).toThrow(/positions has 200001 values; at most 200000 are accepted/);
      expect(() => leastSquaresStraightness({ positionsMm: many.slice(1), readingsMm: many.slice(1) })).not.toThrow();
    });
  });
});
