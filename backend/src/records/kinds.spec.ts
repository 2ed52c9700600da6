import type { CheckRecordedEvent, RecordsService } from './records.service.js';
import {
  CHECK_KIND_NAMES,
  CHECK_KINDS,
  EVIDENCE_SUBJECT_TYPES,
  isRecordType,
  RECORD_TYPE_NAMES,
  RECORD_TYPES,
  recordTypeLabel,
  SIGNED_RECORD_TYPES,
  type CheckKind,
} from './kinds.js';

// Checked by the type-checker (npm run check), which fails on an @ts-expect-error that no longer
// finds an error: a misspelt kind must not compile where locks, audits and checks take one.
type LockKind = Parameters<RecordsService['assertEditable']>[0];
type AuditKind = Parameters<RecordsService['audit']>[1]['recordType'];
const lockable: LockKind = 'rail-sweep';
// @ts-expect-error a misspelt record kind is no record kind, so the lock cannot be skipped by a typo
const misspeltLock: LockKind = 'rail_sweep';
// @ts-expect-error no approval stands on a hole pattern: it cannot be asked for a lock
const unsignedLock: LockKind = 'hole-pattern';
// @ts-expect-error the history takes only the registry's kinds
const misspeltAudit: AuditKind = 'sweep';
// @ts-expect-error a check kind is one of the board's
const misspeltCheck: CheckRecordedEvent['kind'] = 'straightness';
const typed = [lockable, misspeltLock, unsignedLock, misspeltAudit, misspeltCheck];

describe('the kinds list', () => {
  it('keeps every check in a record an approval can lock and sign', () => {
    for (const kind of CHECK_KIND_NAMES)
      expect([kind, SIGNED_RECORD_TYPES.includes(CHECK_KINDS[kind].recordType)]).toEqual([kind, true]);
    for (const type of SIGNED_RECORD_TYPES)
      expect([type, typeof (RECORD_TYPES[type] as { table?: string }).table]).toEqual([type, 'string']);
  });

  it('names every kind once and in plain words, and an unknown one in words made from it', () => {
    const labels = RECORD_TYPE_NAMES.map((k) => RECORD_TYPES[k].label);
    expect(new Set(labels).size).toBe(labels.length);
    expect(new Set(CHECK_KIND_NAMES.map((k: CheckKind) => CHECK_KINDS[k].label)).size).toBe(CHECK_KIND_NAMES.length);
    expect(EVIDENCE_SUBJECT_TYPES).toEqual(
      expect.arrayContaining(['machine', 'rail-sweep', 'backlash-check', 'safety-item']),
    );
    expect(recordTypeLabel('positioning-run')).toBe('Positioning run');
    expect(recordTypeLabel('retired-kind')).toBe('Retired kind');
    expect([isRecordType('rail-sweep'), isRecordType('rail_sweep'), isRecordType('toString')]).toEqual([
      true,
      false,
      false,
    ]);
    expect(typed).toHaveLength(5);
  });
});
