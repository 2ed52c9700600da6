import { EngineInputError } from './engine-input-error.js';
import { referenceJson } from './reference-data/reference-data.js';
import { expectRelative } from './relative.test-support.js';
import { evaluateSquareness } from './squareness.js';

describe('squareness from diagonals', () => {
  // Parallelogram diagonal relation (law of cosines), constructed example: a 1000 × 600 mm
  // rectangle whose Y side leans 0.5 mm over 600 mm.
  it('matches the constructed 1000 × 600 mm example (γ = 8.3333e-4 rad, 0.5 mm over 600 mm)', () => {
    const ex = referenceJson('squareness_diagonals.json').worked_examples_derived_here[0];
    const r = evaluateSquareness({
      sideXMm: 1000,
      sideYMm: Math.hypot(600, 0.5),
      diagonal1Mm: ex.diagonal_AC_mm,
      diagonal2Mm: ex.diagonal_BD_mm,
      gantrySpanMm: 600,
    });
    expectRelative(r.outOfSquareRad, ex.gamma_true_rad, 1e-9);
    expectRelative(r.outOfSquareArcsec, ex.gamma_arcsec, 1e-6);
    expect(r.longDiagonal).toBe(1);
    expect(r.diagonalDifferenceMm).toBeCloseTo(ex.difference_mm, 12);
    // Over the 600 mm side the lean is the 0.5 mm the example was built with.
    expect(r.correctionMm).toBeCloseTo(ex.offset_over_600mm_mm, 6);
    expect(r.mmPerMetre).toBeCloseTo((0.5 / 600) * 1000, 6);
    expect(r.warnings).toEqual([]);
  });

  // Constructed square example: small-angle form γ ≈ (q − p)/d0 for a square.
  it('matches the constructed 500 mm square and the small-angle form', () => {
    const ex = referenceJson('squareness_diagonals.json').worked_examples_derived_here[1];
    const side = Math.hypot(500, 0.25);
    const r = evaluateSquareness({
      sideXMm: 500,
      sideYMm: side,
      diagonal1Mm: ex.diagonal_BD_mm,
      diagonal2Mm: ex.diagonal_AC_mm,
    });
    expectRelative(r.outOfSquareRad, ex.gamma_true_rad, 1e-9);
    expectRelative(r.outOfSquareRad, ex.gamma_approx_dd_over_d0_rad, 1e-6);
    expect(r.longDiagonal).toBe(2);
    // Default span is sideX: 500 × tan γ.
    expect(r.spanMm).toBe(500);
    expect(r.correctionMm).toBeCloseTo(500 * Math.tan(ex.gamma_true_rad), 12);
  });

  // Geometry check built from corner coordinates: a parallelogram skewed by a known angle.
  it('recovers the skew of parallelograms built from coordinates', () => {
    for (const gammaDeg of [0.001, 0.05, 0.5, 3]) {
      const g = (gammaDeg * Math.PI) / 180;
      const a = 1500;
      const b = 3000;
      // A(0,0) B(a,0) D(b sin g, b cos g) C = B + D.
      const D = [b * Math.sin(g), b * Math.cos(g)];
      const C = [a + D[0], D[1]];
      const r = evaluateSquareness({
        sideXMm: a,
        sideYMm: b,
        diagonal1Mm: Math.hypot(C[0], C[1]),
        diagonal2Mm: Math.hypot(D[0] - a, D[1]),
      });
      expectRelative(r.outOfSquareDeg, gammaDeg, 1e-7);
      expectRelative(r.correctionMm, a * Math.tan(g), 1e-7);
    }
  });

  it('gives zero for equal diagonals', () => {
    const d = Math.hypot(1000, 600);
    const r = evaluateSquareness({ sideXMm: 1000, sideYMm: 600, diagonal1Mm: d, diagonal2Mm: d });
    expect(r.outOfSquareDeg).toBe(0);
    expect(r.correctionMm).toBe(0);
  });

  it('warns when the diagonals do not belong to the sides, and refuses impossible ones', () => {
    const r = evaluateSquareness({ sideXMm: 1000, sideYMm: 600, diagonal1Mm: 1200, diagonal2Mm: 1199 });
    expect(r.warnings[0]).toMatch(/diagonals do not match the sides/);
    expect(() => evaluateSquareness({ sideXMm: 10, sideYMm: 10, diagonal1Mm: 1000, diagonal2Mm: 1 })).toThrow(
      EngineInputError,
    );
    expect(() => evaluateSquareness({ sideXMm: 0, sideYMm: 10, diagonal1Mm: 14, diagonal2Mm: 14 })).toThrow(
      'sideX must be greater than zero',
    );
    expect(() =>
      evaluateSquareness({ sideXMm: 10, sideYMm: 10, diagonal1Mm: 14, diagonal2Mm: 14, gantrySpanMm: -1 }),
    ).toThrow('gantrySpan must be greater than zero');
  });
});
