import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { railKeys, type Parallelism } from '../types';

export const parallelismQueryOptions = (railId: string) =>
  queryOptions({
    queryKey: railKeys.parallelism(railId),
    queryFn: () => api.get<Parallelism>(`/rails/${railId}/parallelism`),
  });

export const useParallelism = (railId: string, enabled = true) =>
  useQuery({ ...parallelismQueryOptions(railId), enabled });
