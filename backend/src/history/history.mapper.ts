import { fieldLabel, isShownField, kindLabel, tableLabel } from './history-labels.js';

export interface HistoryRow {
  id: string;
  at: Date;
  atText: string;
  actorName: string;
  machineId: string | null;
  machineName: string | null;
  recordType: string;
  recordId: string | null;
  action: string;
  summary: string;
  changes: Record<string, unknown> | null;
  txid: number;
}

export interface ChangeRow {
  txid: number;
  tableName: string;
  recordId: string | null;
  operation: 'insert' | 'update' | 'delete';
  oldValues: Record<string, unknown> | null;
  newValues: Record<string, unknown> | null;
}

/** One value that changed: which record, which field, before and after (null where there was none). */
export interface FieldChange {
  record: string;
  operation: 'created' | 'changed' | 'deleted';
  field: string;
  before: unknown;
  after: unknown;
}

export interface HistoryEntryResponse {
  id: string;
  /** ISO 8601 with the zone (UTC). */
  at: string;
  actor: string;
  /** The plain name of what the entry is about, e.g. "Rail sweep". */
  kind: string;
  recordType: string;
  recordId: string | null;
  machine: { id: string; name: string } | null;
  action: string;
  summary: string;
  /** What the service said changed (kept for readers of the summary). */
  changes: Record<string, unknown> | null;
  /** Every value the command changed, from the database's change log of the same transaction. */
  fieldChanges: FieldChange[];
}

export interface HistoryPage {
  entries: HistoryEntryResponse[];
  nextCursor: string | null;
}

// Bookkeeping tables whose rows say nothing a reader needs beside the summary.
const UNSHOWN_TABLES = new Set(['record_locks']);
const OPERATION_WORDS = { insert: 'created', update: 'changed', delete: 'deleted' } as const;

/** A change-log row as the values a person reads; secrets appear only as "changed". */
export function toFieldChanges(row: ChangeRow): FieldChange[] {
  if (UNSHOWN_TABLES.has(row.tableName)) return [];
  const before = row.oldValues ?? {};
  const after = row.newValues ?? {};
  const out: FieldChange[] = [];
  const record = tableLabel(row.tableName);
  const operation = OPERATION_WORDS[row.operation];
  if (row.tableName === 'users' && row.operation === 'update' && before.password_hash !== after.password_hash) {
    out.push({ record, operation, field: 'password', before: null, after: 'changed' });
  }
  for (const column of new Set([...Object.keys(before), ...Object.keys(after)])) {
    if (!isShownField(column)) continue;
    const b = column in before ? before[column] : null;
    const a = column in after ? after[column] : null;
    if (row.operation === 'update' && JSON.stringify(b) === JSON.stringify(a)) continue;
    if (row.operation !== 'update' && (row.operation === 'insert' ? a : b) === null) continue;
    const shown = shownValue(column, b, a);
    out.push({
      record,
      operation,
      field: shown.field ?? fieldLabel(column),
      before: row.operation === 'insert' ? null : shown.before,
      after: row.operation === 'delete' ? null : shown.after,
    });
  }
  return out;
}

/**
 * Shares a transaction's row changes out among its summaries: a row goes to the summary about
 * that record, the rest to the first summary the command wrote, so nothing shows twice.
 */
export function assignChanges(
  txEntries: { id: string; txid: number; recordId: string | null }[],
  changes: ChangeRow[],
): Map<string, FieldChange[]> {
  const byEntry = new Map<string, FieldChange[]>();
  for (const change of changes) {
    const ofTx = txEntries.filter((e) => e.txid === change.txid);
    if (!ofTx.length) continue;
    const owner = ofTx.find((e) => e.recordId && e.recordId === change.recordId) ?? ofTx[0];
    const list = byEntry.get(owner.id) ?? [];
    list.push(...toFieldChanges(change));
    byEntry.set(owner.id, list);
  }
  return byEntry;
}

export const toHistoryEntry = (row: HistoryRow, fieldChanges: FieldChange[]): HistoryEntryResponse => ({
  id: row.id,
  at: row.at.toISOString(),
  actor: row.actorName,
  kind: kindLabel(row.recordType),
  recordType: row.recordType,
  recordId: row.recordId,
  machine: row.machineId ? { id: row.machineId, name: row.machineName ?? 'a machine no longer listed' } : null,
  action: row.action,
  summary: row.summary,
  changes: row.changes,
  fieldChanges,
});

// How PostgreSQL writes a timestamptz as text, e.g. 2026-03-01 09:15:02.123456+00.
const STORED_TIME = /^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d(\.\d{1,6})?[+-]\d\d(:\d\d)?$/;

/** The cursor names the last entry shown: its stored time (to the microsecond) and id. */
export const encodeCursor = (row: HistoryRow): string => Buffer.from(`${row.atText}|${row.id}`).toString('base64url');

export function decodeCursor(cursor: string): { at: string; id: string } | null {
  const [at, id] = Buffer.from(cursor, 'base64url').toString('utf8').split('|');
  if (!at || !id || !/^[0-9a-f-]{36}$/i.test(id) || !STORED_TIME.test(at)) return null;
  return { at, id };
}

/**
 * Values stored counted from zero (a hole's index) are shown counted from one, as the summary and
 * every screen number them: "hole 3" is the third hole everywhere.
 */
function shownValue(
  column: string,
  before: unknown,
  after: unknown,
): { field?: string; before: unknown; after: unknown } {
  if (column === 'hole_index') {
    const plusOne = (v: unknown) => (typeof v === 'number' ? v + 1 : v);
    return { field: 'hole', before: plusOne(before), after: plusOne(after) };
  }
  return { before, after };
}
