import { canonicalJson } from '../canonical-json.js';
import type { ApprovalRow } from '../approvals.repository.js';
import { isSignedRecordKind, SIGNED_RECORDS } from './signed-record-kinds.js';
import type { LiveRow } from './signed-records.repository.js';

export const SIGNED_RECORD_FORMAT = 'railwright-signed-record/1';

/** One record the approval stands on, as read now; null row when it no longer exists. */
export interface LiveRecord {
  kind: string;
  id: string;
  row: LiveRow | null;
  children?: LiveRow[];
}

/** Dates become ISO strings at every depth; everything else is left as the database gave it. */
export function plain(value: unknown): unknown {
  if (value instanceof Date) return value.toISOString();
  if (Array.isArray(value)) return value.map(plain);
  if (value && typeof value === 'object')
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, plain(v)]));
  return value;
}

/** Key of a record in the signed content: kind and id, so a difference names the record it is in. */
export const recordKey = (kind: string, id: string) => `${kind}:${id}`;

function recordEntry(r: LiveRecord): Record<string, unknown> {
  if (!isSignedRecordKind(r.kind))
    return { kind: r.kind, id: r.id, row: null, note: 'a kind of record whose rows are not signed' };
  const spec = SIGNED_RECORDS[r.kind];
  if (!r.row) return { kind: r.kind, id: r.id, row: null, note: 'the record no longer exists' };
  const row = Object.fromEntries(Object.entries(r.row).filter(([k]) => !spec.unsigned?.includes(k)));
  const entry: Record<string, unknown> = { kind: r.kind, id: r.id, row: plain(row) };
  if (spec.children) entry[spec.children.name] = plain(r.children ?? []);
  return entry;
}

/**
 * What the owner's signature covers: the manifestation (who, when, what they stated, the re-check
 * date), the results as shown when signing, the target values judged against, and the full row
 * of every record the approval stands on with its child rows. As canonical JSON (keys sorted,
 * no spaces), so the same records always give the same text.
 */
export function signedContent(a: ApprovalRow, records: LiveRecord[]): string {
  return canonicalJson({
    format: SIGNED_RECORD_FORMAT,
    approval: {
      id: a.id,
      workshopId: a.workshopId,
      machineId: a.machineId,
      requestId: a.requestId,
      signerId: a.approvedById,
      signerName: a.approvedByName,
      approvedAt: a.approvedAt.toISOString(),
      statement: a.statement,
      recheckDueAt: a.recheckDueAt.toISOString(),
      recheckIntervalDays: a.recheckIntervalDays,
    },
    snapshot: plain(a.snapshot),
    targetValues: plain(a.targetValues ?? null),
    records: Object.fromEntries(records.map((r) => [recordKey(r.kind, r.id), recordEntry(r)])),
  });
}
