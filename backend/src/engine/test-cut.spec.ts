import { evaluateTestCut, type TestCutInput } from './test-cut.js';

const base: TestCutInput = {
  x: { commandedMm: 300, measuredMm: 300 },
  y: { commandedMm: 300, measuredMm: 300 },
};

describe('test cut', () => {
  // Calibration rule new = old × commanded ÷ measured (common practice), per axis.
  it('gives each axis its scale error and corrected steps per mm', () => {
    const r = evaluateTestCut({
      ...base,
      x: { commandedMm: 300, measuredMm: 299.4 },
      stepsPerMmX: 80,
      stepsPerMmY: 80,
    });
    expect(r.x.scale).toBeCloseTo(0.998, 14);
    expect(r.x.errorMm).toBeCloseTo(-0.6, 12);
    expect(r.x.errorPercent).toBeCloseTo(-0.2, 12);
    expect(r.x.correctedStepsPerMm).toBeCloseTo((80 * 300) / 299.4, 12);
    expect(r.y.correctedStepsPerMm).toBe(80);
  });

  // Trade fact (common practice): for a square of side a with skew δ the diagonals differ by about √2·δ.
  it('finds the skew of the cut square from its diagonals', () => {
    const skew = 0.3;
    const r = evaluateTestCut({
      ...base,
      diagonal1Mm: Math.hypot(300 + skew, 300),
      diagonal2Mm: Math.hypot(300 - skew, 300),
    });
    expect(r.squareness!.diagonalDifferenceMm).toBeCloseTo(Math.SQRT2 * skew, 3);
    expect(r.squareness!.correctionMm).toBeCloseTo(skew, 3);
    expect(r.squareness!.longDiagonal).toBe(1);
  });

  it('reads a round circle as round', () => {
    const r = evaluateTestCut({
      ...base,
      circle: { commandedDiameterMm: 100, measuredXMm: 100.02, measuredYMm: 99.99 },
    });
    expect(r.ovality!.pointsTo).toBe('round');
    expect(r.ovality!.ovalityMm).toBeCloseTo(0.03, 12);
  });

  // Worked by hand: X scale 1.004 and Y scale 1.000 on a 100 mm circle make X 0.4 mm long.
  it('puts ovality down to scale when the axes’ scale errors explain it', () => {
    const r = evaluateTestCut({
      x: { commandedMm: 300, measuredMm: 301.2 },
      y: { commandedMm: 300, measuredMm: 300 },
      circle: { commandedDiameterMm: 100, measuredXMm: 100.4, measuredYMm: 100 },
    });
    expect(r.ovality!.fromScaleMm).toBeCloseTo(0.4, 12);
    expect(r.ovality!.pointsTo).toBe('scale');
  });

  it('points to backlash on the axis the circle is short along', () => {
    const r = evaluateTestCut({ ...base, circle: { commandedDiameterMm: 100, measuredXMm: 99.7, measuredYMm: 100 } });
    expect(r.ovality!.pointsTo).toBe('x-backlash');
    expect(r.ovality!.backlashEstimateMm).toBeCloseTo(0.3, 12);
    const s = evaluateTestCut({ ...base, circle: { commandedDiameterMm: 100, measuredXMm: 100, measuredYMm: 99.6 } });
    expect(s.ovality!.pointsTo).toBe('y-backlash');
  });

  it('notes kerf when square and circle are off by the same millimetres', () => {
    const r = evaluateTestCut({
      x: { commandedMm: 300, measuredMm: 299.2 },
      y: { commandedMm: 300, measuredMm: 299.2 },
      circle: { commandedDiameterMm: 50, measuredXMm: 49.2, measuredYMm: 49.2 },
    });
    expect(r.notes.join(' ')).toMatch(/kerf width compensation/);
  });

  it('names the problem on bad input', () => {
    expect(() => evaluateTestCut({ ...base, x: { commandedMm: 0, measuredMm: 1 } })).toThrow(
      'x.commanded must be greater than zero',
    );
    expect(() => evaluateTestCut({ ...base, diagonal1Mm: 424 })).toThrow('give both diagonals or neither');
    expect(() =>
      evaluateTestCut({ ...base, circle: { commandedDiameterMm: 100, measuredXMm: NaN, measuredYMm: 100 } }),
    ).toThrow('circle.measuredX must be a finite number');
  });
});
