import { iso9013Class2, ISO9013_REFERENCE } from './iso9013.js';

describe('ISO 9013 class 2 part tolerance', () => {
  // TRADE.md (common practice, citing ISO 9013): class 2 is about ±0.9 mm on 35–125 mm parts in 3–6 mm plate.
  it('gives ±0.9 mm for 35–125 mm parts in 3.15–6.3 mm plate', () => {
    for (const size of [35, 50, 100, 124.9]) {
      for (const t of [3.2, 5, 6, 6.3])
        expect(iso9013Class2(size, t)).toMatchObject({
          toleranceMm: 0.9,
          sizeBandMm: [35, 125],
          thicknessBandMm: [3.15, 6.3],
          outside: null,
        });
    }
    expect(ISO9013_REFERENCE.toleranceMm).toBe(0.9);
  });

  // The band a 400 mm square falls in is 315–1000 mm, not 35–125 mm (band limits from memory).
  it('judges a 400 mm square in its own band, not the 35–125 mm one', () => {
    const band = iso9013Class2(400, 6);
    expect(band.sizeBandMm).toEqual([315, 1000]);
    expect(band.toleranceMm).not.toBe(0.9);
    // From memory of the class 2 table: ±1.2 mm for 315–1000 mm parts in 3.15–6.3 mm plate.
    expect(band.toleranceMm).toBe(1.2);
  });

  // Band limits (from memory): sizes ≥ lower and < upper; thickness over lower, up to and including upper.
  it('puts boundary values in the band the standard does', () => {
    expect(iso9013Class2(125, 5).sizeBandMm).toEqual([125, 315]);
    expect(iso9013Class2(34.99, 5).sizeBandMm).toEqual([10, 35]);
    expect(iso9013Class2(100, 6.3).thicknessBandMm).toEqual([3.15, 6.3]);
    expect(iso9013Class2(100, 6.31).thicknessBandMm).toEqual([6.3, 10]);
    expect(iso9013Class2(100, 3.15).thicknessBandMm).toEqual([1, 3.15]);
  });

  // Thicker plate and larger parts never get a tighter class 2 tolerance (the table grows both ways).
  it('never tightens with a larger part or a thicker plate', () => {
    const sizes = [1, 5, 20, 80, 200, 500, 1500, 3000];
    const thicknesses = [0.5, 2, 5, 8, 20, 80, 120];
    for (const t of thicknesses) {
      const row = sizes.map((s) => iso9013Class2(s, t).toleranceMm);
      row.forEach((v, i) => i && expect(v).toBeGreaterThanOrEqual(row[i - 1]));
    }
    for (const s of sizes) {
      const col = thicknesses.map((t) => iso9013Class2(s, t).toleranceMm);
      col.forEach((v, i) => i && expect(v).toBeGreaterThanOrEqual(col[i - 1]));
    }
  });

  it('says when a part or a plate is beyond the table, and what it used', () => {
    expect(iso9013Class2(5000, 5).outside).toMatch(/5000 mm size is beyond the table's largest band \(2000–4000 mm\)/);
    expect(iso9013Class2(100, 200).outside).toMatch(/200 mm plate is beyond the table's thickest band/);
    // No value for 0–3 mm parts in 6.3–10 mm plate: the next size band is used.
    const small = iso9013Class2(2, 8);
    expect(small.sizeBandMm).toEqual([3, 10]);
    expect(small.outside).toMatch(/gives no value for 0–3 mm parts/);
  });
});
