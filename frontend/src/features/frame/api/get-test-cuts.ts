import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { frameKeys } from '../types';

export const testCutsQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: frameKeys.testCuts(machineId),
    queryFn: () => answer(client.GET('/api/machines/{id}/test-cuts', { params: { path: { id: machineId } } })),
  });

export const useTestCuts = (machineId: string) => useQuery(testCutsQueryOptions(machineId));
