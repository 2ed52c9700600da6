import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { safetyKeys } from '../types';

export const safetyWalkQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: safetyKeys.walk(machineId),
    queryFn: () => answer(client.GET('/api/machines/{id}/safety-walk', { params: { path: { id: machineId } } })),
  });

export const useSafetyWalk = (machineId: string) => useQuery(safetyWalkQueryOptions(machineId));
