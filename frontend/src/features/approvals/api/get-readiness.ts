import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { approvalKeys } from '../types';

export const readinessQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: approvalKeys.readiness(machineId),
    queryFn: () => answer(client.GET('/api/machines/{id}/readiness', { params: { path: { id: machineId } } })),
  });

export const useReadiness = (machineId: string) => useQuery(readinessQueryOptions(machineId));
