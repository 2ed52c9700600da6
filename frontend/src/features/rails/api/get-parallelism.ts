import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { railKeys } from '../types';

export const parallelismQueryOptions = (railId: string) =>
  queryOptions({
    queryKey: railKeys.parallelism(railId),
    queryFn: () => answer(client.GET('/api/rails/{id}/parallelism', { params: { path: { id: railId } } })),
  });

export const useParallelism = (railId: string, enabled = true) =>
  useQuery({ ...parallelismQueryOptions(railId), enabled });
