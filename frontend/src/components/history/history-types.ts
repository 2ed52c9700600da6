import type { Schemas } from '../../lib/api/schemas';

/** One entry of a history as the server sends it (machine or workshop). */
export type HistoryEntry = Schemas['HistoryEntryResponse'];
export type HistoryPage = Schemas['HistoryPage'];

/** The filters a reader sets; dates are local calendar days (yyyy-mm-dd). */
export interface HistoryFilters {
  kind: string;
  person: string;
  fromDay: string;
  toDay: string;
}

export const NO_FILTERS: HistoryFilters = { kind: '', person: '', fromDay: '', toDay: '' };

/** The query of a page: local days become instants with the reader's zone. */
export function historyQuery(filters: HistoryFilters, cursor: string | null, limit = 25) {
  return {
    limit,
    kind: filters.kind || undefined,
    person: filters.person.trim() || undefined,
    from: filters.fromDay ? new Date(`${filters.fromDay}T00:00:00`).toISOString() : undefined,
    to: filters.toDay ? new Date(`${filters.toDay}T23:59:59.999`).toISOString() : undefined,
    cursor: cursor ?? undefined,
  };
}
