import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { frameKeys, type TestCut } from '../types';

export const testCutsQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: frameKeys.testCuts(machineId),
    queryFn: () => api.get<TestCut[]>(`/machines/${machineId}/test-cuts`),
  });

export const useTestCuts = (machineId: string) => useQuery(testCutsQueryOptions(machineId));
