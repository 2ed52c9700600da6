import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { holePatternKeys, type HolePattern } from '../types';

export const holePatternsQueryOptions = (machineId: string) =>
  queryOptions({ queryKey: holePatternKeys.list(machineId), queryFn: () => api.get<HolePattern[]>(`/machines/${machineId}/hole-patterns`) });

export const useHolePatterns = (machineId: string) => useQuery(holePatternsQueryOptions(machineId));
