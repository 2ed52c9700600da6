import type { HistoryFilters } from '../../components/history/history-types';

/** The feature's query keys. */
export const historyKeys = {
  all: ['workshop-history'] as const,
  list: (filters: HistoryFilters) => [...historyKeys.all, filters] as const,
};
