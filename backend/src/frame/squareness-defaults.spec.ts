import { evaluateSquareness } from '../engine/squareness.js';
import { PLASMA_DEFAULTS, ROUTER_DEFAULTS } from '../target-sets/default-target-sets.js';

/**
 * The squareness defaults re-derived from their cited source (TRADE.md, common practice):
 * routers 0.1–0.25 mm diagonal difference on a 500–1000 mm square, plasma tables 0.5–1 mm over a
 * sheet-sized test. The squares are built from corner coordinates with a skew δ (so the diagonals
 * differ by about √2·δ, the trade's rule) and measured by the engine; a default must not allow
 * more than the source does.
 */
function mmPerMetreFor(side: number, diagonalDifference: number): number {
  // A square skewed by δ: diagonals hypot(a + δ, a) and hypot(a − δ, a) differ by about √2·δ.
  const skew = diagonalDifference / Math.SQRT2;
  const r = evaluateSquareness({
    sideXMm: side,
    sideYMm: Math.hypot(side, skew),
    diagonal1Mm: Math.hypot(side + skew, side),
    diagonal2Mm: Math.hypot(side - skew, side),
  });
  expect(r.diagonalDifferenceMm).toBeCloseTo(diagonalDifference, 3);
  return r.mmPerMetre;
}

describe('squareness defaults against their source', () => {
  it('plasma: no looser than 0.5 mm diagonal difference on a 1500 mm (sheet-width) square', () => {
    const fromSource = mmPerMetreFor(1500, 0.5);
    expect(fromSource).toBeCloseTo(0.2357, 3);
    expect(PLASMA_DEFAULTS.squareness).toMatchObject({ unit: 'mm/m' });
    expect(PLASMA_DEFAULTS.squareness.value).toBeLessThanOrEqual(fromSource);
    // And on the loosest reading of the source (1 mm on a 1250 mm sheet width) it is well inside.
    expect(PLASMA_DEFAULTS.squareness.value).toBeLessThan(mmPerMetreFor(1250, 1));
    expect(PLASMA_DEFAULTS.squareness.source).toMatch(/√2·δ/);
  });

  it('router: no looser than 0.1 mm on 500 mm nor 0.25 mm on 1000 mm', () => {
    const small = mmPerMetreFor(500, 0.1);
    const large = mmPerMetreFor(1000, 0.25);
    expect(small).toBeCloseTo(0.1414, 3);
    expect(large).toBeCloseTo(0.1768, 3);
    expect(ROUTER_DEFAULTS.squareness.value).toBeLessThanOrEqual(Math.min(small, large));
    expect(ROUTER_DEFAULTS.squareness.source).toMatch(/√2·δ/);
  });

  it('the plasma default is coarser than the router one (a plasma table is coarser)', () => {
    expect(PLASMA_DEFAULTS.squareness.value).toBeGreaterThan(ROUTER_DEFAULTS.squareness.value);
  });
});
