import { toFieldChanges } from './history.mapper.js';

describe('history: values as people read them', () => {
  it('numbers holes from one, as the bolt-down screen and the entry summary do (hole index 2 is "hole 3")', () => {
    const changes = toFieldChanges({
      txid: 1,
      tableName: 'bolt_down_holes',
      recordId: 'x',
      operation: 'insert',
      oldValues: null,
      newValues: { id: 'a0c4', bolt_down_id: 'b9e1', hole_index: 2, reading_mm: 0.012, fixed: true },
    });
    expect(changes).toContainEqual({
      record: 'Bolt-down hole',
      operation: 'created',
      field: 'hole',
      before: null,
      after: 3,
    });
    expect(changes.map((c) => c.field)).not.toContain('hole index');
  });

  it('leaves internal ids, hashes and bookkeeping out, and says only "changed" of a password', () => {
    const changes = toFieldChanges({
      txid: 1,
      tableName: 'users',
      recordId: 'x',
      operation: 'update',
      oldValues: { id: 'u1', workshop_id: 'w1', password_hash: 'scrypt$old', name: 'Ada', updated_at: '2026-01-01' },
      newValues: { id: 'u1', workshop_id: 'w1', password_hash: 'scrypt$new', name: 'Ada B', updated_at: '2026-01-02' },
    });
    expect(changes).toEqual([
      { record: 'Person', operation: 'changed', field: 'password', before: null, after: 'changed' },
      { record: 'Person', operation: 'changed', field: 'name', before: 'Ada', after: 'Ada B' },
    ]);
  });
});
