import { evaluateParallelism } from './parallelism.js';

describe('parallelism', () => {
  // Definition (common practice): parallelism is the spread of B − A read against one datum.
  it('takes the spread and mean of B − A station by station (worked by hand)', () => {
    const r = evaluateParallelism({
      positionsMm: [0, 250, 500, 750, 1000],
      railAMm: [0.0, 0.01, 0.02, 0.01, 0.0],
      railBMm: [0.1, 0.12, 0.11, 0.1, 0.13],
    });
    const expected = [0.1, 0.11, 0.09, 0.09, 0.13];
    r.differencesMm.forEach((d, i) => expect(d).toBeCloseTo(expected[i], 15));
    expect(r.parallelismMm).toBeCloseTo(0.04, 15);
    expect(r.meanOffsetMm).toBeCloseTo(0.104, 15);
  });

  it('is zero for two rails that differ by a constant height', () => {
    const a = [0.003, -0.02, 0.011, 0.04];
    const r = evaluateParallelism({ positionsMm: [0, 1, 2, 3], railAMm: a, railBMm: a.map((v) => v + 0.5) });
    expect(r.parallelismMm).toBeCloseTo(0, 14);
    expect(r.meanOffsetMm).toBeCloseTo(0.5, 14);
  });

  it('names the problem on bad input', () => {
    expect(() => evaluateParallelism({ positionsMm: [0], railAMm: [0], railBMm: [0] })).toThrow(
      'positions needs at least 2 values (got 1)',
    );
    expect(() => evaluateParallelism({ positionsMm: [0, 1, 2], railAMm: [0, 1, 2], railBMm: [0, 1] })).toThrow(
      'positions and railB must have the same length (3 and 2)',
    );
    expect(() => evaluateParallelism({ positionsMm: [0, 1, 1], railAMm: [0, 1, 2], railBMm: [0, 1, 2] })).toThrow(
      /positions repeats the value 1/,
    );
    expect(() => evaluateParallelism({ positionsMm: [0, 1], railAMm: [0, NaN], railBMm: [0, 1] })).toThrow(
      'railA[1] must be a finite number',
    );
  });
});
