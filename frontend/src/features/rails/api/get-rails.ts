import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { railKeys } from '../types';

export const railsQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: railKeys.list(machineId),
    queryFn: () => answer(client.GET('/api/machines/{id}/rails', { params: { path: { id: machineId } } })),
  });

export const useRails = (machineId: string) => useQuery(railsQueryOptions(machineId));
