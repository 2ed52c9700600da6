import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { holePatternKeys, type HolePattern } from '../types';

export const holePatternQueryOptions = (id: string) => queryOptions({ queryKey: holePatternKeys.one(id), queryFn: () => api.get<HolePattern>(`/hole-patterns/${id}`) });

export const useHolePattern = (id: string) => useQuery(holePatternQueryOptions(id));
