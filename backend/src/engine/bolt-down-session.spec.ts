import { boltDownGuide, planHoles } from './bolt-down.js';
import { boltDownSession, type SessionHoleInput } from './bolt-down-session.js';
import { EngineInputError } from './engine-input-error.js';

// A 1000 mm rail with holes every 250 mm from 0: holes 0…4 at 0, 250, 500, 750, 1000 mm.
const POSITIONS = [0, 250, 500, 750, 1000];
const fixedAt = (readingMm: number, fixSeq: number): SessionHoleInput => ({ readingMm, fixed: true, fixSeq });

describe('bolt-down session (holes fixed as recorded at the machine)', () => {
  // Common practice: fix one end, then the far end, then halve the gaps, so each new hole is set
  // between two that are already tight. For five holes: 0, 4, 2, then 1 and 3.
  it('proposes the ends first, then the middles, and names the next open hole', () => {
    const s = boltDownSession(POSITIONS, 'line', new Map());
    expect(s.holes.map((h) => h.order)).toEqual([0, 3, 2, 4, 1]);
    expect(s.nextHole).toBe(0);
    expect(s.holes.every((h) => h.targetMm === null)).toBe(true);
    expect(s).toMatchObject({ fixedCount: 0, complete: false });
  });

  // Common practice for line mode: each new hole is aimed at the straight line between the
  // nearest fixed holes on either side. Worked by hand:
  //   hole 0 fixed at 0.000 mm, hole 4 (1000 mm) at 0.040 mm → hole 2 (500 mm) aims at 0.020 mm;
  //   hole 2 fixed at 0.030 mm → hole 1 (250) aims at (0 + 0.030)/2 = 0.015 mm,
  //   hole 3 (750) aims at (0.030 + 0.040)/2 = 0.035 mm.
  it('aims each open hole at the line through its nearest fixed neighbours (worked by hand)', () => {
    const holes = new Map([
      [0, fixedAt(0, 1)],
      [4, fixedAt(0.04, 2)],
    ]);
    let s = boltDownSession(POSITIONS, 'line', holes);
    expect(s.holes[4].targetMm).toBe(0); // set against hole 0 alone
    expect(s.holes[2].targetMm).toBeCloseTo(0.02, 12);
    expect(s.nextHole).toBe(2);

    holes.set(2, fixedAt(0.03, 3));
    s = boltDownSession(POSITIONS, 'line', holes);
    expect(s.holes[1].targetMm).toBeCloseTo(0.015, 12);
    expect(s.holes[3].targetMm).toBeCloseTo(0.035, 12);
    // A fixed hole keeps the aim it was fixed against, and how far it ended up from it.
    expect(s.holes[2].targetMm).toBeCloseTo(0.02, 12);
    expect(s.holes[2].differenceMm).toBeCloseTo(0.01, 12);
    expect(s.nextHole).toBe(1);
    expect(s.fixedCount).toBe(3);
  });

  // Common practice for face mode: the indicator rides on a carriage against the frame's
  // reference face, so every hole is brought to the reading of the first hole fixed.
  it('aims every hole at the first fixed reading in face mode', () => {
    const s = boltDownSession(
      POSITIONS,
      'face',
      new Map([
        [0, fixedAt(0.012, 1)],
        [4, fixedAt(0.02, 2)],
      ]),
    );
    for (const i of [1, 2, 3, 4]) expect(s.holes[i].targetMm).toBe(0.012);
    expect(s.holes[0].targetMm).toBeNull(); // the first hole sets the datum
    expect(s.holes[4].differenceMm).toBeCloseTo(0.008, 12);
  });

  it('follows the order holes were actually fixed, not the proposed one', () => {
    // Hole 2 fixed first (out of order): it becomes the face datum; the next proposed hole is still 0.
    const s = boltDownSession(
      POSITIONS,
      'face',
      new Map([
        [2, fixedAt(0.05, 1)],
        [0, fixedAt(0.049, 2)],
      ]),
    );
    expect(s.holes[2].targetMm).toBeNull();
    expect(s.holes[0].targetMm).toBe(0.05);
    expect(s.holes[1].targetMm).toBe(0.05);
    expect(s.nextHole).toBe(4);
  });

  it('moves the datum to the next fixed hole when the first one is loosened again', () => {
    const s = boltDownSession(
      POSITIONS,
      'face',
      new Map<number, SessionHoleInput>([
        [0, { readingMm: 0, fixed: false, fixSeq: null }],
        [4, fixedAt(0.04, 2)],
      ]),
    );
    expect(s.holes[0].targetMm).toBe(0.04);
    expect(s.holes[0].differenceMm).toBeCloseTo(-0.04, 12);
    expect(s.nextHole).toBe(0);
    expect(s.fixedCount).toBe(1);
  });

  it('shows the difference of a typed reading that is not fixed yet without counting it', () => {
    const s = boltDownSession(
      POSITIONS,
      'line',
      new Map<number, SessionHoleInput>([
        [0, fixedAt(0, 1)],
        [4, fixedAt(0.04, 2)],
        [2, { readingMm: 0.025, fixed: false, fixSeq: null }],
      ]),
    );
    expect(s.holes[2].differenceMm).toBeCloseTo(0.005, 12);
    expect(s.holes[2].fixed).toBe(false);
    expect(s.nextHole).toBe(2);
    expect(s.fixedCount).toBe(2);
  });

  it('is complete once every hole is fixed', () => {
    const holes = new Map(POSITIONS.map((_, i) => [i, fixedAt(i * 0.001, i)] as const));
    const s = boltDownSession(POSITIONS, 'line', holes);
    expect(s).toMatchObject({ complete: true, nextHole: null, fixedCount: 5 });
    expect(boltDownSession([], 'line', new Map()).complete).toBe(false);
  });

  it('agrees with the guide walk when holes are fixed in the proposed order', () => {
    const plan = planHoles({ lengthMm: 1000, pitchMm: 60, firstHoleOffsetMm: 20 });
    const readings = [0.01, -0.02, 0.005, 0.03, 0];
    const byHole = new Map(plan.fixingOrder.slice(0, readings.length).map((hole, k) => [hole, readings[k]] as const));
    const guide = boltDownGuide(plan, 'line', byHole);
    const s = boltDownSession(
      plan.positionsMm,
      'line',
      new Map([...byHole].map(([hole, r], k) => [hole, fixedAt(r, k)] as const)),
    );
    expect(s.nextHole).toBe(guide.nextHole);
    for (const step of guide.steps) {
      if (step.targetMm === null) expect(s.holes[step.hole].targetMm).toBeNull();
      else expect(s.holes[step.hole].targetMm).toBeCloseTo(step.targetMm, 12);
    }
  });

  it('names the problem on bad input', () => {
    expect(() => boltDownSession(POSITIONS, 'edge' as never, new Map())).toThrow('mode must be one of face, line');
    expect(() => boltDownSession(POSITIONS, 'line', new Map([[5, fixedAt(0, 1)]]))).toThrow(
      'hole 5 is not on this rail',
    );
    expect(() => boltDownSession(POSITIONS, 'line', new Map([[1, fixedAt(Number.NaN, 1)]]))).toThrow(
      'reading at hole 1 must be a finite number',
    );
    expect(() =>
      boltDownSession(POSITIONS, 'line', new Map([[1, { readingMm: null, fixed: true, fixSeq: 1 }]])),
    ).toThrow(EngineInputError);
  });
});
