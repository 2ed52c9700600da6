import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { historyQuery, type HistoryFilters } from '../../../components/history/history-types';
import { machineKeys } from '../../../lib/machine-keys';

export const machineHistoryQueryOptions = (id: string, filters: HistoryFilters) =>
  infiniteQueryOptions({
    // Under machineKeys.history(id), so every change that invalidates it refreshes each filtered view.
    queryKey: [...machineKeys.history(id), filters] as const,
    queryFn: ({ pageParam }) =>
      answer(
        client.GET('/api/machines/{id}/history', { params: { path: { id }, query: historyQuery(filters, pageParam) } }),
      ),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
  });

export const useMachineHistory = (id: string, filters: HistoryFilters) =>
  useInfiniteQuery(machineHistoryQueryOptions(id, filters));
