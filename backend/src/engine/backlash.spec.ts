import { evaluateBacklash } from './backlash.js';
import { arrayToMm } from './units.js';

const mm = (um: number[]) => arrayToMm(um, 'um');

describe('backlash at both ends and the middle', () => {
  // Hand-worked from the definition b_i = |mean(up) − mean(down)| (ISO 230-2:2014 reversal value
  // B_i = x̄_i↑ − x̄_i↓ for one target, formulas from memory in reference/iso230_2_formulas.md) and
  // "report the largest" (TRADE.md: common practice). Readings in µm:
  //   10 mm:  up 12, 10, 11 → 11;  down −8, −10, −9 → −9;  B = 11 − (−9) = 20 µm
  //   450 mm: up 20, 22, 24 → 22;  down 5, 4, 6 → 5;       B = 17 µm
  //   890 mm: up 0, 2, 1 → 1;      down 31, 29, 30 → 30;   B = −29 µm, size 29 µm (largest)
  //   mean of the sizes (20 + 17 + 29) / 3 = 22 µm
  const example = [
    { positionMm: 10, upMm: mm([12, 10, 11]), downMm: mm([-8, -10, -9]) },
    { positionMm: 450, upMm: mm([20, 22, 24]), downMm: mm([5, 4, 6]) },
    { positionMm: 890, upMm: mm([0, 2, 1]), downMm: mm([31, 29, 30]) },
  ];

  it('reproduces the hand-worked example position by position and for the axis', () => {
    const r = evaluateBacklash({ positions: example });
    expect(r.positions.map((p) => p.meanUpMm * 1000)).toEqual([
      expect.closeTo(11, 9),
      expect.closeTo(22, 9),
      expect.closeTo(1, 9),
    ]);
    expect(r.positions.map((p) => p.meanDownMm * 1000)).toEqual([
      expect.closeTo(-9, 9),
      expect.closeTo(5, 9),
      expect.closeTo(30, 9),
    ]);
    expect(r.positions.map((p) => p.reversalMm * 1000)).toEqual([
      expect.closeTo(20, 9),
      expect.closeTo(17, 9),
      expect.closeTo(-29, 9),
    ]);
    expect(r.positions.map((p) => p.backlashMm * 1000)).toEqual([
      expect.closeTo(20, 9),
      expect.closeTo(17, 9),
      expect.closeTo(29, 9),
    ]);
    expect(r.backlashMm * 1000).toBeCloseTo(29, 9);
    expect(r.worstPositionMm).toBe(890);
    expect(r.meanBacklashMm * 1000).toBeCloseTo(22, 9);
    expect(r.positions[1].rangeUpMm * 1000).toBeCloseTo(4, 9);
    expect(r.warnings).toEqual([]);
  });

  it('the same readings in thou give the same backlash (1 in = 25.4 mm exactly, NIST SP 811)', () => {
    const thou = example.map((p) => ({
      ...p,
      upMm: arrayToMm(
        p.upMm.map((v) => v / 0.0254),
        'thou',
      ),
      downMm: arrayToMm(
        p.downMm.map((v) => v / 0.0254),
        'thou',
      ),
    }));
    expect(evaluateBacklash({ positions: thou }).backlashMm).toBeCloseTo(
      evaluateBacklash({ positions: example }).backlashMm,
      12,
    );
  });

  it('swapping the two sides keeps the size and flips the sign (the definition is symmetric in size)', () => {
    const swapped = example.map((p) => ({ positionMm: p.positionMm, upMm: p.downMm, downMm: p.upMm }));
    const a = evaluateBacklash({ positions: example });
    const b = evaluateBacklash({ positions: swapped });
    b.positions.forEach((p, i) => {
      expect(p.reversalMm).toBeCloseTo(-a.positions[i].reversalMm, 12);
      expect(p.backlashMm).toBeCloseTo(a.positions[i].backlashMm, 12);
    });
  });

  it('warns about fewer than 3 approaches a side (TRADE.md: 3+ runs, common practice)', () => {
    const r = evaluateBacklash({ positions: [{ positionMm: 10, upMm: mm([12, 10]), downMm: mm([-8, -10, -9]) }] });
    expect(r.warnings.map((w) => w.code)).toEqual(['few-approaches']);
    expect(r.warnings[0].message).toMatch(/Fewer than 3 approaches from a side at 10 mm/);
  });

  it('warns when the indicator is coarser than a quarter of the target (the issue: resolution finer than a quarter of the tolerance, common practice)', () => {
    // target 0.05 mm → a quarter is 12.5 µm; a 0.01 mm indicator passes, a 0.02 mm one does not.
    expect(evaluateBacklash({ positions: example, resolutionMm: 0.01, targetMm: 0.05 }).warnings).toEqual([]);
    const coarse = evaluateBacklash({ positions: example, resolutionMm: 0.02, targetMm: 0.05 });
    expect(coarse.warnings.map((w) => w.code)).toEqual(['coarse-instrument']);
    expect(coarse.warnings[0].message).toMatch(
      /steps of 20\.0 µm, coarser than a quarter of the 50\.0 µm target \(12\.5 µm\)/,
    );
  });

  it('warns when the readings of one side spread more than the backlash they give', () => {
    const r = evaluateBacklash({ positions: [{ positionMm: 100, upMm: mm([0, 10, 2]), downMm: mm([0, 1, 2]) }] });
    // up mean 4, down mean 1 → 3 µm backlash; up spread 10 µm
    expect(r.backlashMm * 1000).toBeCloseTo(3, 9);
    expect(r.warnings.map((w) => w.code)).toEqual(['scatter-above-backlash']);
  });

  it('refuses positions without readings, naming the field', () => {
    expect(() => evaluateBacklash({ positions: [] })).toThrow(/positions must hold at least one position/);
    expect(() => evaluateBacklash({ positions: [{ positionMm: 5, upMm: [], downMm: [0.01] }] })).toThrow(
      /positions\[0\]\.up/,
    );
    expect(() => evaluateBacklash({ positions: [{ positionMm: 5, upMm: [0.01], downMm: [Number.NaN] }] })).toThrow(
      /positions\[0\]\.down\[0\] must be a finite number/,
    );
  });
});
