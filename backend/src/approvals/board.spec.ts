import type { ReadinessCheck } from '../records/readiness.js';
import type { WaiverRow } from './approvals.repository.js';
import { blockingOf, boardChecks } from './board.js';

const check = (over: Partial<ReadinessCheck>): ReadinessCheck => ({
  key: 'k',
  kind: 'rail-straightness',
  subject: 'Rail Y1',
  status: 'outside-target',
  target: { value: 20, unit: 'um' },
  result: { value: 31, unit: 'µm', summary: '' },
  recordType: 'rail-sweep',
  recordId: '11111111-1111-4111-8111-111111111111',
  recordedAt: '2026-11-30T10:00:00.000Z',
  place: { machineId: 'm', tab: 'frame' },
  ...over,
});

const waiver = (over: Partial<WaiverRow>): WaiverRow => ({
  id: 'w',
  workshopId: 'ws',
  machineId: 'm',
  checkKey: 'k',
  recordType: 'rail-sweep',
  recordId: '11111111-1111-4111-8111-111111111111',
  reason: 'Good enough for sheet work.',
  waivedById: 'u',
  waivedByName: 'Owner',
  waivedAt: new Date('2026-11-30T12:00:00Z'),
  ...over,
});

describe('boardChecks', () => {
  it('waives a check only for the record the waiver was given on', () => {
    const [same] = boardChecks([check({})], [waiver({})]);
    expect(same).toMatchObject({
      status: 'waived',
      measuredStatus: 'outside-target',
      waiver: { reason: 'Good enough for sheet work.', by: 'Owner' },
    });
    const [other] = boardChecks([check({ recordId: '22222222-2222-4222-8222-222222222222' })], [waiver({})]);
    expect(other).toMatchObject({ status: 'outside-target', waiver: null });
  });

  it('lets a waiver given before any record cover the not-started check, and nothing after a record exists', () => {
    const notStarted = check({ status: 'not-started', result: null, recordId: null, recordType: null });
    expect(boardChecks([notStarted], [waiver({ recordId: null, recordType: null })])[0].status).toBe('waived');
    expect(boardChecks([check({})], [waiver({ recordId: null, recordType: null })])[0].status).toBe('outside-target');
  });

  it('ignores waivers on checks within target, and blocks only not-started and outside-target ones', () => {
    const checks = boardChecks(
      [
        check({ key: 'a', status: 'within-target' }),
        check({ key: 'b', status: 'not-started' }),
        check({ key: 'c' }),
        check({ key: 'd' }),
      ],
      [waiver({ checkKey: 'a' }), waiver({ checkKey: 'd' })],
    );
    expect(checks.map((c) => [c.key, c.status])).toEqual([
      ['a', 'within-target'],
      ['b', 'not-started'],
      ['c', 'outside-target'],
      ['d', 'waived'],
    ]);
    expect(blockingOf(checks).map((c) => c.key)).toEqual(['b', 'c']);
  });

  it('orders checks by kind as the board reads (rails first, safety walk last), then subject', () => {
    const checks = boardChecks(
      [
        check({ key: 's', kind: 'safety-walk', subject: 'Machine' }),
        check({ key: 'p2', kind: 'positioning', subject: 'Axis Y' }),
        check({ key: 'p1', kind: 'positioning', subject: 'Axis X' }),
        check({ key: 'r', subject: 'Rail X' }),
      ],
      [],
    );
    expect(checks.map((c) => c.key)).toEqual(['r', 'p1', 'p2', 's']);
  });
});
