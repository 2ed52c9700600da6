import { referenceCsv } from './reference-data/reference-data.js';
import { heightDifference, permissibleHeightDifferenceMm } from './rail-height.js';
import { defaultEndDistanceMm, endDistanceProblem } from './rail-holes.js';
import { localSlope } from './rail-slope.js';
import { sweepWarnings } from './rail-warnings.js';
import { holePositions } from './bolt-down.js';
import { evaluateStraightness } from './straightness.js';
import { arrayToMm } from './units.js';

describe('local slope along a rail', () => {
  // Definition of slope, rise over run (× 1000 for mm/m); worked by hand: residuals 0, 0.01,
  // 0.04, 0.03 mm at 0, 100, 200, 300 mm give steps of 0.1, 0.3 and 0.1 mm/m, the largest 0.3.
  it('is the largest rise over run between neighbouring stations, in mm/m', () => {
    const r = localSlope([0, 100, 200, 300], [0, 0.01, 0.04, 0.03]);
    expect(r.mmPerM).toBeCloseTo(0.3, 12);
    expect([r.fromMm, r.toMm]).toEqual([100, 200]);
  });

  // Same data over a 200 mm base, by hand: |0.04 − 0| / 200 and |0.03 − 0.01| / 200 → 0.2 mm/m.
  it('over a stated base compares each station with the first one at least the base further on', () => {
    const r = localSlope([0, 100, 200, 300], [0, 0.01, 0.04, 0.03], 200);
    expect(r.mmPerM).toBeCloseTo(0.2, 12);
    expect(r.baseMm).toBe(200);
  });

  // Constructed set S1 (straightness_examples.csv): a straight tilt added to the readings does not
  // change the slope of the minimum-zone residuals (ISO 1101 judges the form, not the set-up).
  it('reads the residuals, so a set-up tilt of the indicator is not slope', () => {
    const rows = referenceCsv('straightness_examples.csv').filter((r) => r.case === 'S1_rail_dial_indicator');
    const x = rows.map((r) => Number(r.x));
    const y = arrayToMm(
      rows.map((r) => Number(r.y)),
      'um',
    );
    const tilted = y.map((v, i) => v + 0.0005 * x[i]);
    const a = evaluateStraightness({ positionsMm: x, readingsMm: y }).minimumZone.residualsMm;
    const b = evaluateStraightness({ positionsMm: x, readingsMm: tilted }).minimumZone.residualsMm;
    expect(localSlope(x, b).mmPerM).toBeCloseTo(localSlope(x, a).mmPerM, 9);
  });
});

describe('height difference of partner rails', () => {
  // TRADE.md (one maker's catalogue): about 130 µm at 500 mm spacing for light preload → K = 0.26 µm/mm.
  it('S = a × K gives 130 µm at 500 mm spacing with K = 0.26 µm per mm', () => {
    expect(permissibleHeightDifferenceMm(500, 0.26)).toBeCloseTo(0.13, 12);
    expect(permissibleHeightDifferenceMm(1000, 0.26)).toBeCloseTo(0.26, 12);
  });

  // Worst station by hand: B − A = 0.01, −0.03, 0.02 → the largest magnitude is 0.03 at 200 mm.
  it('is the worst station, not the mean of the differences', () => {
    const r = heightDifference([0, 200, 400], [0, 0.05, 0], [0.01, 0.02, 0.02]);
    expect(r.worstMm).toBeCloseTo(0.03, 12);
    expect(r.worstSignedMm).toBeCloseTo(-0.03, 12);
    expect(r.atMm).toBe(200);
  });

  // Two sweeps of the same shape zeroed 12 thou apart: against one datum the readings agree, so
  // the worst station is 0 (the 12 thou was the zeroing, not a height).
  it('two rails of the same shape at one height give no height difference', () => {
    const shape = [0, 0.01, 0.015, 0.01, 0];
    expect(heightDifference([0, 1, 2, 3, 4], shape, shape).worstMm).toBe(0);
  });
});

describe('end distance of rail holes', () => {
  // 800 mm rail, 60 mm pitch, first hole at 20 mm: 20 + 13 × 60 = 800, a hole on the end (by hand).
  it('finds the hole that sits exactly on the far end', () => {
    const holes = holePositions({ lengthMm: 800, pitchMm: 60, firstHoleOffsetMm: 20 });
    expect(holes[holes.length - 1]).toBe(800);
    expect(endDistanceProblem(holes, 800, defaultEndDistanceMm('M5'))).toEqual({
      end: 'end',
      positionMm: 800,
      clearanceMm: 0,
    });
  });

  it('finds a hole too near the start and accepts a rail whose holes keep the distance', () => {
    expect(endDistanceProblem([2, 62, 122], 140, 4.25)?.end).toBe('start');
    expect(endDistanceProblem([20, 80, 140], 160, 4.25)).toBeNull();
  });

  // ISO 4762 head diameter of an M5 socket head cap screw, 8.5 mm (from memory): half is 4.25 mm.
  it('defaults to half the bolt head', () => {
    expect(defaultEndDistanceMm('M5')).toBe(4.25);
    expect(defaultEndDistanceMm('M4')).toBe(3.5);
    expect(defaultEndDistanceMm(null)).toBe(4.25);
  });
});

describe('sweep warnings', () => {
  const show = (mm: number) => `${+(mm * 1000).toFixed(3)} µm`;
  // The 4:1 rule of instrument resolution against tolerance (common practice).
  it('warns when the indicator is coarser than a quarter of the tolerance', () => {
    const w = sweepWarnings({
      stationCount: 10,
      resolutionMm: 0.01,
      toleranceMm: 0.02,
      reference: 'minimum-zone',
      spanMm: 900,
      railLengthMm: 1000,
      show,
    });
    expect(w.map((x) => x.code)).toEqual(['coarse-instrument']);
    expect(w[0].message).toContain('10 µm');
    expect(w[0].message).toContain('5 µm');
    expect(
      sweepWarnings({
        stationCount: 10,
        resolutionMm: 0.005,
        toleranceMm: 0.02,
        reference: 'minimum-zone',
        spanMm: 900,
        railLengthMm: 1000,
        show,
      }),
    ).toEqual([]);
  });

  it('warns of too few stations and of a sweep that covers little of the rail', () => {
    const w = sweepWarnings({
      stationCount: 4,
      resolutionMm: null,
      toleranceMm: 0.02,
      reference: 'least-squares',
      spanMm: 300,
      railLengthMm: 1000,
      show,
    });
    expect(w.map((x) => x.code)).toEqual(['few-stations', 'short-sweep']);
  });
});
