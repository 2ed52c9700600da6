import { canonicalJson } from '../canonical-json.js';
import { diffJson, recordDifferences } from './record-diff.js';

describe('record differences', () => {
  it('names each changed leaf by its path, with the value signed and the value now', () => {
    expect(diffJson({ a: 1, b: { c: [1, 2, 3] } }, { a: 1, b: { c: [1, 5, 3] } })).toEqual([
      { path: '$.b.c[1]', signed: 2, current: 5 },
    ]);
  });

  it('reports members and array items added or removed', () => {
    expect(diffJson({ a: [1] }, { a: [1, 2], z: true })).toEqual([
      { path: '$.a[1]', signed: undefined, current: 2 },
      { path: '$.z', signed: undefined, current: true },
    ]);
  });

  it('finds nothing between equal records, whatever their key order', () => {
    expect(diffJson({ a: 1, b: [{ x: 1, y: 2 }] }, { b: [{ y: 2, x: 1 }], a: 1 })).toEqual([]);
  });

  it('names the record a difference is in, quoting keys that are not plain names', () => {
    const record = (reading: number) => ({ kind: 'rail-sweep', id: 'r1', row: { readingsRaw: [0, reading] } });
    const signed = canonicalJson({ statement: 'Ready.', records: { 'rail-sweep:r1': record(2) } });
    const now = canonicalJson({ statement: 'Ready!', records: { 'rail-sweep:r1': record(7) } });
    expect(recordDifferences(signed, now)).toEqual([
      {
        path: 'records["rail-sweep:r1"].row.readingsRaw[1]',
        record: { kind: 'rail-sweep', id: 'r1' },
        change: 'changed',
        signed: 2,
        current: 7,
      },
      { path: 'statement', record: null, change: 'changed', signed: 'Ready.', current: 'Ready!' },
    ]);
  });

  it('shows a record that disappeared as removed, and a value that appeared as added', () => {
    const signed = canonicalJson({ records: { 'waiver:w1': { kind: 'waiver', id: 'w1', row: { reason: 'r' } } } });
    const now = canonicalJson({ records: {}, extra: 1 });
    expect(recordDifferences(signed, now)).toEqual([
      { path: 'extra', record: null, change: 'added', signed: null, current: 1 },
      {
        path: 'records["waiver:w1"]',
        record: { kind: 'waiver', id: 'w1' },
        change: 'removed',
        signed: { kind: 'waiver', id: 'w1', row: { reason: 'r' } },
        current: null,
      },
    ]);
  });
});
