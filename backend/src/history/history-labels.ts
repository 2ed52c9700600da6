import { RECORD_TYPE_NAMES, RECORD_TYPES, recordTypeLabel } from '../records/kinds.js';

/** Plain words for what a history entry is about: the record type's label in records/kinds.ts. */
export const kindLabel = (recordType: string): string => recordTypeLabel(recordType);

/** The tables the change log names, in the same plain words: a record's table by its kind (records/kinds.ts), and the rest. */
const TABLE_LABELS: Record<string, string> = {
  workshops: 'Workshop',
  bolt_down_holes: 'Bolt-down hole',
  bolt_down_writes: 'Bolt-down reading',
  safety_answers: 'Safety-walk answer',
  record_locks: 'Approval lock',
  password_links: 'Password link',
  ...Object.fromEntries(
    RECORD_TYPE_NAMES.flatMap((k) => {
      const spec: { table?: string; label: string } = RECORD_TYPES[k];
      return spec.table ? [[spec.table, spec.label]] : [];
    }),
  ),
};

export const tableLabel = (table: string): string => TABLE_LABELS[table] ?? table.replace(/_/g, ' ');

/**
 * Columns not shown to people: internal ids, bookkeeping times and anything that is a secret or
 * a hash (the change log already masks password hashes and link tokens; these keep them out).
 */
const HIDDEN = new Set([
  'id',
  'created_at',
  'updated_at',
  'last_activity_at',
  'version',
  'sessions_valid_from',
  'token_hash',
  'password_hash',
]);

export function isShownField(column: string): boolean {
  if (HIDDEN.has(column)) return false;
  if (column === 'id' || column.endsWith('_id')) return false;
  return !/(hash|token|signature|secret)/.test(column);
}

/** "work_area_x_mm" → "work area x mm": the column in words. */
export const fieldLabel = (column: string): string => column.replace(/_/g, ' ');
