import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { frameKeys, type DiagonalCheck } from '../types';

export const diagonalChecksQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: frameKeys.diagonalChecks(machineId),
    queryFn: () => api.get<DiagonalCheck[]>(`/machines/${machineId}/diagonal-checks`),
  });

export const useDiagonalChecks = (machineId: string) => useQuery(diagonalChecksQueryOptions(machineId));
