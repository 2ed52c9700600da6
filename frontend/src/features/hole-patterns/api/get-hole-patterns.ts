import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { holePatternKeys } from '../types';

export const holePatternsQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: holePatternKeys.list(machineId),
    queryFn: () => answer(client.GET('/api/machines/{id}/hole-patterns', { params: { path: { id: machineId } } })),
  });

export const useHolePatterns = (machineId: string) => useQuery(holePatternsQueryOptions(machineId));
