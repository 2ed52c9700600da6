import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { frameKeys } from '../types';

export const diagonalChecksQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: frameKeys.diagonalChecks(machineId),
    queryFn: () => answer(client.GET('/api/machines/{id}/diagonal-checks', { params: { path: { id: machineId } } })),
  });

export const useDiagonalChecks = (machineId: string) => useQuery(diagonalChecksQueryOptions(machineId));
