import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { historyQuery, type HistoryFilters } from '../../../components/history/history-types';
import { historyKeys } from '../types';

export const workshopHistoryQueryOptions = (filters: HistoryFilters) =>
  infiniteQueryOptions({
    queryKey: historyKeys.list(filters),
    queryFn: ({ pageParam }) =>
      answer(client.GET('/api/history', { params: { query: historyQuery(filters, pageParam) } })),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
  });

export const useWorkshopHistory = (filters: HistoryFilters) => useInfiniteQuery(workshopHistoryQueryOptions(filters));
