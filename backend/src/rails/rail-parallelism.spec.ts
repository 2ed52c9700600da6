import { partnerParallelism } from './rail-parallelism.js';
import type { SweepRow } from './rails.repository.js';

const sweep = (id: string, positionsMm: number[], readingsMm: number[], datum: string | null, day: number) =>
  ({ id, positionsMm, readingsMm, datum, takenAt: new Date(2026, 0, day) }) as unknown as SweepRow;
const labels = { a: 'Y1', b: 'Y2' };

describe('partner parallelism from stored sweeps', () => {
  it('pairs stations by position, whatever order each sweep was read in', () => {
    const a = sweep('a', [0, 100, 200, 300], [0, 0.01, 0.02, 0.01], 'wire', 2);
    const b = sweep('b', [300, 200, 100, 0], [0.05, 0.04, 0.03, 0.02], 'wire', 3);
    const out = partnerParallelism([a], [b], labels);
    if (!out.comparable) throw new Error(out.reason);
    // By hand: B − A at 0, 100, 200, 300 mm = 0.02, 0.02, 0.02, 0.04 → spread 0.02, mean 0.025.
    expect(out.positionsMm).toEqual([0, 100, 200, 300]);
    out.differencesMm.forEach((d, i) => expect(d).toBeCloseTo([0.02, 0.02, 0.02, 0.04][i], 12));
    expect(out.parallelismMm).toBeCloseTo(0.02, 12);
    expect(out.meanOffsetMm).toBeCloseTo(0.025, 12);
  });

  it('takes the newest pair on a shared datum and ignores sweeps without one', () => {
    const oldA = sweep('oldA', [0, 100], [0, 0], 'Bar', 1);
    const oldB = sweep('oldB', [0, 100], [0.1, 0.1], 'bar ', 1);
    const newA = sweep('newA', [0, 100], [0, 0], 'Wire', 5);
    const newB = sweep('newB', [0, 100], [0.2, 0.3], 'wire', 6);
    const loose = sweep('loose', [0, 100], [9, 9], null, 9);
    const out = partnerParallelism([loose, newA, oldA], [newB, oldB], labels);
    expect(out.comparable && [out.a.id, out.b.id]).toEqual(['newA', 'newB']);
  });

  it('says why when stations or datums differ', () => {
    const a = sweep('a', [0, 100, 200], [0, 0, 0], 'wire', 1);
    expect(partnerParallelism([a], [sweep('b', [0, 100, 250], [0, 0, 0], 'wire', 1)], labels)).toMatchObject({
      comparable: false,
      reason: expect.stringMatching(/stations differ/),
    });
    expect(partnerParallelism([a], [sweep('b', [0, 100, 200], [0, 0, 0], 'bar', 1)], labels)).toMatchObject({
      comparable: false,
      reason: expect.stringMatching(/same datum/),
    });
    expect(partnerParallelism([], [a], labels)).toMatchObject({ comparable: false, reason: 'No sweep of rail Y1 yet' });
  });
});
