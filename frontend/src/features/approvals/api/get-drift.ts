import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { approvalKeys, type Drift } from '../types';

export const driftQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: approvalKeys.drift(machineId),
    queryFn: () => api.get<Drift>(`/machines/${machineId}/drift`),
  });

export const useDrift = (machineId: string, enabled = true) => useQuery({ ...driftQueryOptions(machineId), enabled });
