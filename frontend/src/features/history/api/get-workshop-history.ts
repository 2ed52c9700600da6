import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { historyQuery, type HistoryFilters, type HistoryPage } from '../../../components/history/history-types';
import { historyKeys } from '../types';

export const workshopHistoryQueryOptions = (filters: HistoryFilters) =>
  infiniteQueryOptions({
    queryKey: historyKeys.list(filters),
    queryFn: ({ pageParam }) => api.get<HistoryPage>(`/history?${historyQuery(filters, pageParam)}`),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
  });

export const useWorkshopHistory = (filters: HistoryFilters) => useInfiniteQuery(workshopHistoryQueryOptions(filters));
