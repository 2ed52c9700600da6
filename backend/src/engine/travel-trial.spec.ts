import { referenceCsv, referenceJson } from './reference-data/reference-data.js';
import { expectRelative } from './relative.test-support.js';
import { evaluateTravelTrial } from './travel-trial.js';

const movesOf = (file: string) =>
  referenceCsv(file).map((r) => ({ commandedMm: Number(r.x), measuredMm: Number(r.y) }));

describe('travel trial', () => {
  // Calibration rule new = old × commanded ÷ measured (open firmware/printer documentation),
  // check value derived from it: 640 steps/mm, 100 mm commanded, 99.8 mm measured → 641.2826.
  it('corrects 640 steps/mm from one 100 mm move measured 99.8 mm', () => {
    const expected = referenceJson('stepper_steps_per_mm.json').check_values_derived_here.find((c: { case: string }) =>
      c.case.startsWith('calibration'),
    ).new_steps_per_mm;
    const r = evaluateTravelTrial({ stepsPerMmUsed: 640, moves: [{ commandedMm: 100, measuredMm: 99.8 }] });
    expect(r.scale).toBeCloseTo(0.998, 15);
    expect(r.offsetMm).toBe(0);
    expect(r.correctedStepsPerMm).toBeCloseTo(expected, 10);
    expect(r.errorPercent).toBeCloseTo(-0.2, 12);
    expect(r.residualMaxMm).toBeCloseTo(0, 12);
    expect(r.moves[0].errorMm).toBeCloseTo(-0.2, 12);
  });

  // NIST StRD Norris: the fit measured = scale·commanded + offset must give the certified B1, B0.
  it('fits scale and offset to the NIST StRD Norris certified values', () => {
    const cert = referenceJson('nist_strd_norris_certified.json').certified;
    const r = evaluateTravelTrial({ stepsPerMmUsed: 100, moves: movesOf('nist_strd_norris.csv') });
    expectRelative(r.scale, Number(cert.B1.estimate), 1e-13);
    expectRelative(r.offsetMm, Number(cert.B0.estimate), 1e-11);
    expectRelative(r.correctedStepsPerMm, 100 / Number(cert.B1.estimate), 1e-13);
    expectRelative(r.errorPercent, (Number(cert.B1.estimate) - 1) * 100, 1e-10);
  });

  // NIST StRD NoInt1 and NoInt2: the through-origin form of the same fit (B1 = 251/121, 8/11).
  it('fits through the origin to the NIST StRD NoInt1 and NoInt2 certified values', () => {
    const one = evaluateTravelTrial({
      stepsPerMmUsed: 80,
      moves: movesOf('nist_strd_noint1.csv'),
      throughOrigin: true,
    });
    expectRelative(one.scale, Number(referenceJson('nist_strd_noint1_certified.json').certified.B1.estimate), 1e-13);
    expect(one.offsetMm).toBe(0);
    const two = evaluateTravelTrial({
      stepsPerMmUsed: 80,
      moves: movesOf('nist_strd_noint2.csv'),
      throughOrigin: true,
    });
    expectRelative(two.scale, 8 / 11, 1e-14);
    // Largest residual by hand: 3 − 8/11·4 = 1/11, 4 − 40/11 = 4/11, 4 − 48/11 = −4/11.
    expect(two.residualMaxMm).toBeCloseTo(4 / 11, 14);
  });

  it('treats the same move repeated as a fit through the origin', () => {
    const r = evaluateTravelTrial({
      stepsPerMmUsed: 400,
      moves: [
        { commandedMm: 200, measuredMm: 200.3 },
        { commandedMm: 200, measuredMm: 200.5 },
      ],
    });
    expect(r.scale).toBeCloseTo(200.4 / 200, 14);
    expect(r.residualMaxMm).toBeCloseTo(0.1, 10);
  });

  it('names the problem on bad input', () => {
    expect(() => evaluateTravelTrial({ stepsPerMmUsed: 80, moves: [] })).toThrow(
      'moves needs at least 1 value (got 0)',
    );
    expect(() => evaluateTravelTrial({ stepsPerMmUsed: 80, moves: [{ commandedMm: 0, measuredMm: 1 }] })).toThrow(
      'moves[0].commanded must not be zero',
    );
    expect(() => evaluateTravelTrial({ stepsPerMmUsed: 80, moves: [{ commandedMm: 10, measuredMm: NaN }] })).toThrow(
      'moves[0].measured must be a finite number',
    );
    expect(() => evaluateTravelTrial({ stepsPerMmUsed: 80, moves: [{ commandedMm: 10, measuredMm: -10 }] })).toThrow(
      /must grow with the commanded moves/,
    );
    expect(() => evaluateTravelTrial({ stepsPerMmUsed: -1, moves: [{ commandedMm: 10, measuredMm: 10 }] })).toThrow(
      'stepsPerMmUsed must be greater than zero',
    );
  });
});

describe('travel trial guards', () => {
  // The reported case: 20 in commanded, 19.95 in measured, both in inches (unit_facts.json: 1 in = 25.4 mm
  // exactly) → 508 mm against 506.73 mm; new = old × commanded ÷ measured (TRADE.md, common practice).
  it('20 in commanded, 19.95 in measured corrects 80 steps/mm to 80.2', () => {
    const r = evaluateTravelTrial({
      stepsPerMmUsed: 80,
      moves: [{ commandedMm: 508, measuredMm: 506.73 }],
      theoreticalStepsPerMm: 80,
    });
    expect(r.correctedStepsPerMm).toBeCloseTo((80 * 508) / 506.73, 10);
    expect(r.correctedStepsPerMm).toBeCloseTo(80.2, 1);
    expect(r.farFromTheory).toBe(false);
    expect(r.warnings.map((w) => w.code)).toEqual(['single-distance']);
  });

  // The same trial with the commanded 20 read as mm: a 25× correction (320 → 12.6 steps/mm). TRADE.md:
  // "measured far from calculated usually means a wrong ratio, lead or pulley, not tuning".
  it('holds back the 25× correction and names the usual causes', () => {
    const r = evaluateTravelTrial({
      stepsPerMmUsed: 320,
      moves: [{ commandedMm: 20, measuredMm: 506.73 }],
      theoreticalStepsPerMm: 320,
    });
    expect(r.correctedStepsPerMm).toBeCloseTo((320 * 20) / 506.73, 10);
    expect(r.farFromTheory).toBe(true);
    const codes = r.warnings.map((w) => w.code);
    expect(codes).toEqual(expect.arrayContaining(['correction-cannot-be-right', 'correction-far-from-theory']));
    const far = r.warnings.find((w) => w.code === 'correction-far-from-theory')!.message;
    expect(far).toMatch(/lead/);
    expect(far).toMatch(/pulley teeth/);
    expect(far).toMatch(/microsteps/);
  });

  it('a correction 6 % from theory is far; 4 % is not (the 5 % rule)', () => {
    const at = (measured: number) =>
      evaluateTravelTrial({
        stepsPerMmUsed: 100,
        moves: [
          { commandedMm: 100, measuredMm: measured },
          { commandedMm: 200, measuredMm: measured * 2 },
        ],
        theoreticalStepsPerMm: 100,
      });
    expect(at(100 / 1.06).farFromTheory).toBe(true);
    expect(at(100 / 1.04).farFromTheory).toBe(false);
  });

  // ΔL = α·L·ΔT (TRADE.md): a steel tape at 30 °C on a steel machine at 20 °C reads 1000 mm where
  // the machine moved 1000 × (1 + 11.5e-6 × 10) mm; the corrected steps per mm follows.
  it('refers measured moves to 20 °C through the thermal factor', () => {
    const factor = 11.5e-6 * 10;
    const r = evaluateTravelTrial({
      stepsPerMmUsed: 100,
      moves: [{ commandedMm: 1000, measuredMm: 1000 }],
      thermalFactor: factor,
    });
    expect(r.scale).toBeCloseTo(1 + factor, 14);
    expect(r.thermalCorrectionPercent).toBeCloseTo(0.0115, 12);
  });
});
