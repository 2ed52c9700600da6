import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { safetyKeys, type SafetyWalk } from '../types';

export const safetyWalkQueryOptions = (machineId: string) =>
  queryOptions({ queryKey: safetyKeys.walk(machineId), queryFn: () => api.get<SafetyWalk>(`/machines/${machineId}/safety-walk`) });

export const useSafetyWalk = (machineId: string) => useQuery(safetyWalkQueryOptions(machineId));
