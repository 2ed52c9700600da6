import { boltCircleHoles, gridHoles, patternProblems } from './pattern-holes.js';
import { railPattern } from './rail-pattern.js';

const field = (i: number) => `holes[${i}]`;

describe('bolt circle', () => {
  it('spaces holes by the chord PCD · sin(180° / n) (Machinery’s Handbook, bolt circle chordal distance; from memory)', () => {
    for (const [pcd, n] of [
      [100, 6],
      [66.68, 4],
      [127, 5],
      [80, 8],
    ] as const) {
      const holes = boltCircleHoles({
        centreXMm: 50,
        centreYMm: 40,
        circleDiameterMm: pcd,
        count: n,
        startAngleDeg: 15,
        diameterMm: 5,
      });
      expect(holes).toHaveLength(n);
      for (let k = 0; k < n; k++) {
        const a = holes[k];
        const b = holes[(k + 1) % n];
        expect(Math.hypot(b.xMm - a.xMm, b.yMm - a.yMm)).toBeCloseTo(pcd * Math.sin(Math.PI / n), 9);
        expect(Math.hypot(a.xMm - 50, a.yMm - 40)).toBeCloseTo(pcd / 2, 9);
      }
    }
  });

  it('puts four holes at 45° on a 100 mm circle at (±35.355, ±35.355) from the centre (100 / (2·√2))', () => {
    const holes = boltCircleHoles({
      centreXMm: 0,
      centreYMm: 0,
      circleDiameterMm: 100,
      count: 4,
      startAngleDeg: 45,
      diameterMm: 5,
    });
    const q = 50 / Math.SQRT2;
    expect(holes.map((h) => [Math.round(h.xMm * 1e6) / 1e6, Math.round(h.yMm * 1e6) / 1e6])).toEqual([
      [Number(q.toFixed(6)), Number(q.toFixed(6))],
      [-Number(q.toFixed(6)), Number(q.toFixed(6))],
      [-Number(q.toFixed(6)), -Number(q.toFixed(6))],
      [Number(q.toFixed(6)), -Number(q.toFixed(6))],
    ]);
  });
});

describe('grid', () => {
  it('lays rows from the lowest, each left to right, at origin + k · pitch', () => {
    const holes = gridHoles({
      originXMm: 10,
      originYMm: 5,
      rows: 2,
      columns: 3,
      pitchXMm: 0.1,
      pitchYMm: 20,
      diameterMm: 3,
    });
    expect(holes.map((h) => [h.xMm, h.yMm])).toEqual([
      [10, 5],
      [10.1, 5],
      [10 + 2 * 0.1, 5],
      [10, 25],
      [10.1, 25],
      [10 + 2 * 0.1, 25],
    ]);
  });
});

describe('pattern problems', () => {
  it('accepts holes wholly inside, including one touching the edge and two touching each other', () => {
    expect(
      patternProblems(
        100,
        50,
        [
          { xMm: 3, yMm: 25, diameterMm: 6 },
          { xMm: 9, yMm: 25, diameterMm: 6 },
          { xMm: 97, yMm: 47, diameterMm: 6 },
        ],
        field,
      ),
    ).toEqual([]);
  });

  it('names a hole outside the outline, a diameter of 0 and two overlapping holes', () => {
    const problems = patternProblems(
      100,
      50,
      [
        { xMm: 98, yMm: 25, diameterMm: 6 },
        { xMm: 50, yMm: 25, diameterMm: 0 },
        { xMm: 20, yMm: 20, diameterMm: 10 },
        { xMm: 29.9, yMm: 20, diameterMm: 10 },
      ],
      field,
    );
    expect(problems).toEqual([
      expect.stringMatching(/^holes\[0\]: hole 1 .* must lie wholly inside the 100 mm × 50 mm outline/),
      expect.stringMatching(/^holes\[1\]: hole 2 .* diameter greater than 0/),
      expect.stringMatching(/^holes\[3\]: hole 4 overlaps hole 3/),
    ]);
  });

  it('finds an overlap among many holes sorted out of order', () => {
    const holes = Array.from({ length: 500 }, (_, k) => ({ xMm: 5 + ((k * 37) % 500) * 10, yMm: 5, diameterMm: 4 }));
    expect(patternProblems(5010, 10, holes, field)).toEqual([]);
    holes.push({ xMm: 12, yMm: 5, diameterMm: 4 });
    expect(patternProblems(5010, 10, holes, field)).toEqual([
      expect.stringMatching(/^holes\[500\]: hole 501 overlaps hole \d+/),
    ]);
  });
});

describe('rail pattern', () => {
  it('puts the holes on the rail’s centre line and leaves the end distance after the last hole', () => {
    const p = railPattern({
      label: 'Y1',
      lengthMm: 1000,
      profileSizeMm: 20,
      typicalBoltSize: 'M5',
      holePositionsMm: [20, 80, 140, 200, 260, 320, 380, 440, 500, 560, 620, 680, 740, 800, 860, 920, 980],
      holePitchMm: 60,
      firstHoleMm: 20,
    });
    expect(p.widthMm).toBe(1000);
    expect(p.heightMm).toBe(20);
    expect(p.endDistanceMm).toBe(20);
    expect(new Set(p.holes.map((h) => h.yMm))).toEqual(new Set([10]));
    // M5 coarse pitch 0.8 mm: tap drill 5 − 0.8 = 4.2 mm (common practice).
    expect(p.holes[0].diameterMm).toBe(4.2);
  });
});
