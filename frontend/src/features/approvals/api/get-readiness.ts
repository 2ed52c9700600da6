import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { approvalKeys, type Readiness } from '../types';

export const readinessQueryOptions = (machineId: string) =>
  queryOptions({ queryKey: approvalKeys.readiness(machineId), queryFn: () => api.get<Readiness>(`/machines/${machineId}/readiness`) });

export const useReadiness = (machineId: string) => useQuery(readinessQueryOptions(machineId));
