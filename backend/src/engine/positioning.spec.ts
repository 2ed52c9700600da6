import { targetsNeeded, evaluatePositioning, type PositioningRun } from './positioning.js';
import { referenceCsv, referenceJson } from './reference-data/reference-data.js';
import { seededRandom } from './seeded-random.js';
import { arrayToMm } from './units.js';

function constructedRuns() {
  const rows = referenceCsv('iso230_2_constructed_example.csv');
  const targets = [...new Set(rows.map((r) => Number(r.target_mm)))];
  const runs: PositioningRun[] = [];
  for (const direction of ['up', 'down'] as const) {
    for (let run = 1; run <= 5; run++) {
      const um = targets.map((t) =>
        Number(rows.find((r) => r.target_mm === t && r.direction === direction && r.run === run)!.deviation_um),
      );
      runs.push({ direction, deviationsMm: arrayToMm(um, 'um') });
    }
  }
  return { targets, runs };
}

const um = (mm: number) => mm * 1000;

describe('ISO 230-2 positioning', () => {
  // Constructed example (5 targets × 5 runs each way, integer µm) evaluated with ISO 230-2
  // definitions written from memory; exact values B = 4, B̄ = 18/5, R = 4 + 2√2, E = 9,
  // M = 11/2, A = 9 + 2√2. An internal consistency check, not a published one.
  it('reproduces the constructed example per target and for the axis', () => {
    const expected = referenceJson('iso230_2_constructed_example_expected.json');
    const { targets, runs } = constructedRuns();
    const r = evaluatePositioning({ targetsMm: targets, runs });
    expected.per_target.forEach((e: Record<string, number>, i: number) => {
      const t = r.targets[i];
      expect(t.targetMm).toBe(e.target_mm);
      expect(um(t.meanUpMm)).toBeCloseTo(e.mean_up, 12);
      expect(um(t.meanDownMm)).toBeCloseTo(e.mean_down, 12);
      expect(um(t.meanMm)).toBeCloseTo(e.mean_bidir, 12);
      expect(um(t.sUpMm)).toBeCloseTo(e.s_up, 12);
      expect(um(t.sDownMm)).toBeCloseTo(e.s_down, 12);
      expect(um(t.reversalMm)).toBeCloseTo(e.B_i, 12);
      expect(um(t.repeatabilityUpMm)).toBeCloseTo(e.R_up_i, 12);
      expect(um(t.repeatabilityDownMm)).toBeCloseTo(e.R_down_i, 12);
      expect(um(t.repeatabilityMm)).toBeCloseTo(e.R_i, 12);
    });
    const a = expected.axis_results_um;
    expect(um(r.reversalMm)).toBeCloseTo(4, 12);
    expect(um(r.reversalMeanMm)).toBeCloseTo(18 / 5, 12);
    expect(um(r.repeatabilityUpMm)).toBeCloseTo(a.R_up, 12);
    expect(um(r.repeatabilityDownMm)).toBeCloseTo(2 * Math.SQRT2, 12);
    expect(um(r.repeatabilityMm)).toBeCloseTo(4 + 2 * Math.SQRT2, 12);
    expect(um(r.systematicUpMm)).toBeCloseTo(a.E_up, 12);
    expect(um(r.systematicDownMm)).toBeCloseTo(a.E_down, 12);
    expect(um(r.systematicMm)).toBeCloseTo(9, 12);
    expect(um(r.meanRangeMm)).toBeCloseTo(11 / 2, 12);
    expect(um(r.accuracyUpMm)).toBeCloseTo(6 + 2 * Math.SQRT2, 12);
    expect(um(r.accuracyDownMm)).toBeCloseTo(5 + 2 * Math.SQRT2, 12);
    expect(um(r.accuracyMm)).toBeCloseTo(9 + 2 * Math.SQRT2, 12);
    expect(r.warnings).toEqual([]);
  });

  // Worked by hand from the definitions: two targets, two runs each way.
  // Target 0: up 1, 3 (mean 2, s √2), down −1, −1 (mean −1, s 0), B = 3.
  // Target 100: up 0, 0 (mean 0, s 0), down 2, 4 (mean 3, s √2), B = −3.
  it('matches a small case worked by hand, and warns about the short cycle', () => {
    const r = evaluatePositioning({
      targetsMm: [0, 100],
      runs: [
        { direction: 'up', deviationsMm: [1, 0] },
        { direction: 'up', deviationsMm: [3, 0] },
        { direction: 'down', deviationsMm: [-1, 2] },
        { direction: 'down', deviationsMm: [-1, 4] },
      ],
    });
    const r2 = Math.SQRT2;
    expect(r.targets[0].reversalMm).toBeCloseTo(3, 14);
    expect(r.targets[1].reversalMm).toBeCloseTo(-3, 14);
    expect(r.targets[0].repeatabilityMm).toBeCloseTo(3 + 2 * r2, 14);
    expect(r.reversalMm).toBeCloseTo(3, 14);
    expect(r.reversalMeanMm).toBeCloseTo(0, 14);
    expect(r.repeatabilityUpMm).toBeCloseTo(4 * r2, 14);
    expect(r.repeatabilityDownMm).toBeCloseTo(4 * r2, 14);
    expect(r.repeatabilityMm).toBeCloseTo(3 + 2 * r2, 14);
    expect(r.systematicUpMm).toBeCloseTo(2, 14);
    expect(r.systematicDownMm).toBeCloseTo(4, 14);
    expect(r.systematicMm).toBeCloseTo(4, 14);
    expect(r.meanRangeMm).toBeCloseTo(1, 14);
    expect(r.accuracyUpMm).toBeCloseTo(4 * r2, 14);
    expect(r.accuracyDownMm).toBeCloseTo(4 + 2 * r2, 14);
    expect(r.accuracyMm).toBeCloseTo(4 + 2 * r2, 14);
    expect(r.warnings).toHaveLength(2);
    expect(r.warnings[0]).toMatchObject({
      code: 'few-runs',
      message: expect.stringMatching(/5 runs in each direction \(got 2 up, 2 down\)/),
    });
    expect(r.warnings[1].code).toBe('few-targets');
  });

  // Definition property: a constant offset of the whole axis moves the means but no spread.
  it('is unchanged in every spread by a constant offset', () => {
    const rand = seededRandom(9);
    const targets = Array.from({ length: 20 }, (_, i) => i * 50 + Math.round(rand() * 10));
    const runs: PositioningRun[] = Array.from({ length: 10 }, (_, k) => ({
      direction: k % 2 ? 'down' : 'up',
      deviationsMm: targets.map(() => (rand() - 0.5) * 0.02 + (k % 2 ? -0.005 : 0.005)),
    }));
    const a = evaluatePositioning({ targetsMm: targets, runs });
    const b = evaluatePositioning({
      targetsMm: targets,
      runs: runs.map((r) => ({ ...r, deviationsMm: r.deviationsMm.map((d) => d + 0.1) })),
    });
    for (const key of ['reversalMm', 'repeatabilityMm', 'systematicMm', 'meanRangeMm', 'accuracyMm'] as const) {
      expect(b[key]).toBeCloseTo(a[key], 12);
    }
    expect(b.targets[3].meanUpMm - a.targets[3].meanUpMm).toBeCloseTo(0.1, 12);
    // A is never smaller than E (the bands only widen the means' range).
    expect(a.accuracyMm).toBeGreaterThanOrEqual(a.systematicMm);
  });

  it('names the problem on bad input', () => {
    const ok = [0.001, 0.002];
    const runs = (n: number): PositioningRun[] => [
      ...Array.from({ length: n }, () => ({ direction: 'up' as const, deviationsMm: ok })),
      ...Array.from({ length: 2 }, () => ({ direction: 'down' as const, deviationsMm: ok })),
    ];
    expect(() => evaluatePositioning({ targetsMm: [0, 10], runs: runs(1) })).toThrow(
      'runs need at least 2 runs in the up direction (got 1)',
    );
    expect(() => evaluatePositioning({ targetsMm: [0, 10, 20], runs: runs(2) })).toThrow(
      'runs[0].deviations must have one value per target (3, got 2)',
    );
    expect(() => evaluatePositioning({ targetsMm: [0, 0], runs: runs(2) })).toThrow(/targets repeats the value 0/);
    expect(() =>
      evaluatePositioning({
        targetsMm: [0, 10],
        runs: [...runs(2), { direction: 'sideways' as never, deviationsMm: ok }],
      }),
    ).toThrow('runs[4].direction must be up or down');
    expect(() =>
      evaluatePositioning({ targetsMm: [0, 10], runs: [...runs(2), { direction: 'up', deviationsMm: [0, Infinity] }] }),
    ).toThrow('runs[4].deviations[1] must be a finite number');
  });
});

describe('positioning warnings and the reference temperature', () => {
  const runsAt = (targets: number[], n: number, dev: (t: number, k: number) => number): PositioningRun[] =>
    (['up', 'down'] as const).flatMap((direction) =>
      Array.from({ length: n }, (_, k) => ({ direction, deviationsMm: targets.map((t) => dev(t, k)) })),
    );

  // iso230_2_formulas.md (ISO 230-2, from memory): at least 5 targets, and 5 per metre of travel.
  it('asks for 5 targets per metre: 1000 mm of travel with 5 targets is enough, 1500 mm needs 8', () => {
    expect(targetsNeeded(1000)).toBe(5);
    expect(targetsNeeded(1500)).toBe(8);
    expect(targetsNeeded(200)).toBe(5);
    const five = [0, 230, 480, 760, 1000];
    expect(evaluatePositioning({ targetsMm: five, runs: runsAt(five, 5, (t, k) => k * 0.001) }).warnings).toEqual([]);
    const long = [0, 330, 700, 1100, 1500];
    const w = evaluatePositioning({ targetsMm: long, runs: runsAt(long, 5, (t, k) => k * 0.001) }).warnings;
    expect(w.map((x) => x.code)).toEqual(['few-targets']);
    expect(w[0].message).toMatch(/8 over these 1500\.0 mm \(got 5\)/);
  });

  // TRADE.md (common practice, "Data worth capturing"): instrument resolution; the rule of thumb
  // that an instrument should resolve a quarter of the tolerance or better (from memory).
  it('flags an instrument coarser than a quarter of the tolerance', () => {
    const t = [0, 100, 200, 300, 400];
    const base = { targetsMm: t, runs: runsAt(t, 5, (x, k) => k * 0.001), toleranceMm: 0.04 };
    expect(evaluatePositioning({ ...base, instrumentResolutionMm: 0.01 }).warnings).toEqual([]);
    const w = evaluatePositioning({ ...base, instrumentResolutionMm: 0.02 }).warnings;
    expect(w.map((x) => x.code)).toEqual(['coarse-instrument']);
  });

  // ΔL = α·L·ΔT (TRADE.md): an aluminium rule 10 K warm against a steel machine at 20 °C reads
  // short by 23.1e-6 × 10 per mm; the deviation at 400 mm from the first target grows by 0.0924 mm.
  it('refers deviations to 20 °C by their distance from the first target', () => {
    const t = [0, 100, 200, 300, 400];
    const factor = 23.1e-6 * 10;
    const plain = evaluatePositioning({ targetsMm: t, runs: runsAt(t, 5, (x, k) => k * 0.001) });
    const warm = evaluatePositioning({
      targetsMm: t,
      runs: runsAt(t, 5, (x, k) => k * 0.001),
      thermalFactor: factor,
      toleranceMm: 0.05,
    });
    expect(warm.targets[4].meanUpMm - plain.targets[4].meanUpMm).toBeCloseTo(400 * factor, 12);
    expect(warm.targets[0].meanUpMm).toBeCloseTo(plain.targets[0].meanUpMm, 15);
    expect(warm.thermalCorrectionMaxMm).toBeCloseTo(0.0924, 12);
    expect(warm.systematicMm - plain.systematicMm).toBeCloseTo(0.0924, 12);
    expect(warm.warnings.map((x) => x.code)).toEqual(['thermal-correction']);
  });
});
