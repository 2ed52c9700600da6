import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { railKeys, type Sweep } from '../types';

/** Newest first. */
export const sweepsQueryOptions = (railId: string) => queryOptions({ queryKey: railKeys.sweeps(railId), queryFn: () => api.get<Sweep[]>(`/rails/${railId}/sweeps`) });

export const useSweeps = (railId: string) => useQuery(sweepsQueryOptions(railId));
