import { boltDownGuide, fixingOrder, holePositions, planHoles, targetReading } from './bolt-down.js';
import { EngineInputError } from './engine-input-error.js';

describe('bolt-down guide', () => {
  it('places holes at the first offset and every pitch up to the rail end', () => {
    // A 1000 mm rail at 60 mm pitch with the first hole 20 mm in: 20, 80, …, 980 (17 holes).
    const p = holePositions({ lengthMm: 1000, pitchMm: 60, firstHoleOffsetMm: 20 });
    expect(p).toHaveLength(17);
    expect(p[0]).toBe(20);
    expect(p[16]).toBe(980);
    // A hole exactly at the end is kept despite binary rounding (0.1 pitch).
    expect(holePositions({ lengthMm: 0.3, pitchMm: 0.1, firstHoleOffsetMm: 0 })).toHaveLength(4);
  });

  // Common practice: fix one end, the far end, then split the gaps in halves, so every new hole
  // is aligned between two fixed ones.
  it('fixes one end, the far end, then halves the gaps breadth first', () => {
    expect(fixingOrder(1)).toEqual([0]);
    expect(fixingOrder(2)).toEqual([0, 1]);
    expect(fixingOrder(3)).toEqual([0, 2, 1]);
    expect(fixingOrder(9)).toEqual([0, 8, 4, 2, 6, 1, 3, 5, 7]);
    expect(fixingOrder(6)).toEqual([0, 5, 2, 1, 3, 4]);
  });

  it('visits every hole exactly once', () => {
    for (const n of [4, 7, 17, 33, 100]) {
      const order = fixingOrder(n);
      expect(order).toHaveLength(n);
      expect(new Set(order).size).toBe(n);
    }
  });

  it('aims every hole at the first fixed reading in face mode', () => {
    const fixed = [
      { positionMm: 20, readingMm: 0.01 },
      { positionMm: 980, readingMm: 0.05 },
    ];
    expect(targetReading('face', 500, fixed)).toBe(0.01);
    expect(targetReading('face', 20, [])).toBeNull();
  });

  it('aims at the line through the nearest fixed holes in line mode (interpolated by hand)', () => {
    const fixed = [
      { positionMm: 0, readingMm: 0.0 },
      { positionMm: 1000, readingMm: 0.04 },
      { positionMm: 500, readingMm: 0.03 },
    ];
    // Between 0 (0.00) and 500 (0.03): at 250 → 0.015; between 500 and 1000: at 750 → 0.035.
    expect(targetReading('line', 250, fixed)).toBeCloseTo(0.015, 15);
    expect(targetReading('line', 750, fixed)).toBeCloseTo(0.035, 15);
    // Beyond the fixed holes: the nearest one's reading.
    expect(targetReading('line', 1100, fixed)).toBe(0.04);
    expect(targetReading('line', 300, [{ positionMm: 500, readingMm: 0.02 }])).toBe(0.02);
    // At a fixed hole: its own reading.
    expect(targetReading('line', 500, fixed)).toBe(0.03);
  });

  it('walks the order and names the next hole with its target', () => {
    const plan = planHoles({ lengthMm: 480, pitchMm: 60, firstHoleOffsetMm: 0 }); // 9 holes 0…480
    const readings = new Map([
      [0, 0.0],
      [8, 0.08],
    ]);
    const guide = boltDownGuide(plan, 'line', readings);
    expect(guide.nextHole).toBe(4);
    const step4 = guide.steps.find((s) => s.hole === 4)!;
    expect(step4.positionMm).toBe(240);
    expect(step4.targetMm).toBeCloseTo(0.04, 15);
    expect(guide.steps[0].targetMm).toBeNull();
    expect(guide.steps[1].targetMm).toBe(0);
  });

  it('names the problem on bad input', () => {
    expect(() => holePositions({ lengthMm: 1000, pitchMm: 0, firstHoleOffsetMm: 20 })).toThrow(
      'pitch must be greater than zero',
    );
    expect(() => holePositions({ lengthMm: 100, pitchMm: 60, firstHoleOffsetMm: 120 })).toThrow(
      'firstHoleOffset must not be larger than the rail length',
    );
    expect(() => holePositions({ lengthMm: 1e6, pitchMm: 1e-3, firstHoleOffsetMm: 0 })).toThrow(EngineInputError);
    expect(() => targetReading('edge' as never, 0, [])).toThrow('mode must be one of face, line');
  });
});
