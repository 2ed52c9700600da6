import { EngineInputError } from './engine-input-error.js';
import { evaluateTravelTrial } from './travel-trial.js';
import { evaluateStraightness } from './straightness.js';
import { MAX_MAGNITUDE, requireFiniteResult } from './validate.js';

// Nothing the engine returns may hold NaN or ±Infinity: JSON turns them into null and every page
// reading the stored result would break. Double-precision limits: IEEE 754 (largest finite ≈ 1.8e308).
describe('engine refuses what it cannot represent', () => {
  it('refuses a travel trial with a measured move of 1e308, naming the move', () => {
    expect(() => evaluateTravelTrial({ stepsPerMmUsed: 80, moves: [{ commandedMm: 100, measuredMm: 1e308 }] })).toThrow(
      /moves\[0\]\.measured is out of range/,
    );
  });

  it('refuses inputs that are in range one by one but overflow the result', () => {
    // used / scale with scale = 1e-300 → 1e309, beyond the largest double.
    const run = () =>
      evaluateTravelTrial({ stepsPerMmUsed: MAX_MAGNITUDE, moves: [{ commandedMm: 1e9, measuredMm: 1e-291 }] });
    expect(run).toThrow(EngineInputError);
    expect(run).toThrow(/moves give a result that cannot be computed \(correctedStepsPerMm/);
  });

  it('accepts the largest allowed readings and returns finite numbers', () => {
    const r = evaluateStraightness({
      positionsMm: [0, 1, 2],
      readingsMm: [MAX_MAGNITUDE, -MAX_MAGNITUDE, MAX_MAGNITUDE],
    });
    expect(Number.isFinite(r.leastSquares.straightnessMm)).toBe(true);
  });

  it('finds a non-finite number deep in a result and names its path', () => {
    expect(() => requireFiniteResult('runs', { a: [{ b: 1 }, { b: Number.NaN }] })).toThrow(
      /a\[1\]\.b is not a finite number/,
    );
    expect(() => requireFiniteResult('runs', { a: new Float64Array([1, Infinity]) })).toThrow(/a\[1\]/);
    expect(requireFiniteResult('runs', { a: [1, null, 'x'] })).toEqual({ a: [1, null, 'x'] });
  });
});
