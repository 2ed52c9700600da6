/** One entry of a history as the server sends it (machine or workshop). */
export interface HistoryEntry {
  id: string;
  at: string;
  actor: string;
  kind: string;
  recordType: string;
  recordId: string | null;
  machine: { id: string; name: string } | null;
  action: string;
  summary: string;
  changes: Record<string, unknown> | null;
  fieldChanges: { record: string; operation: 'created' | 'changed' | 'deleted'; field: string; before: unknown; after: unknown }[];
}

export interface HistoryPage {
  entries: HistoryEntry[];
  nextCursor: string | null;
}

/** The filters a reader sets; dates are local calendar days (yyyy-mm-dd). */
export interface HistoryFilters {
  kind: string;
  person: string;
  fromDay: string;
  toDay: string;
}

export const NO_FILTERS: HistoryFilters = { kind: '', person: '', fromDay: '', toDay: '' };

/** The query string of a page: local days become instants with the reader's zone. */
export function historyQuery(filters: HistoryFilters, cursor: string | null, limit = 25): string {
  const q = new URLSearchParams({ limit: String(limit) });
  if (filters.kind) q.set('kind', filters.kind);
  if (filters.person.trim()) q.set('person', filters.person.trim());
  if (filters.fromDay) q.set('from', new Date(`${filters.fromDay}T00:00:00`).toISOString());
  if (filters.toDay) q.set('to', new Date(`${filters.toDay}T23:59:59.999`).toISOString());
  if (cursor) q.set('cursor', cursor);
  return q.toString();
}
