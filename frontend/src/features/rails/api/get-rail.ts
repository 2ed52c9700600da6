import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { railKeys } from '../types';

export const railQueryOptions = (id: string) =>
  queryOptions({
    queryKey: railKeys.detail(id),
    queryFn: () => answer(client.GET('/api/rails/{id}', { params: { path: { id } } })),
  });

export const useRail = (id: string) => useQuery(railQueryOptions(id));
