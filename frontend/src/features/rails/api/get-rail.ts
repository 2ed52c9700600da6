import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { railKeys, type Rail } from '../types';

export const railQueryOptions = (id: string) => queryOptions({ queryKey: railKeys.detail(id), queryFn: () => api.get<Rail>(`/rails/${id}`) });

export const useRail = (id: string) => useQuery(railQueryOptions(id));
