import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { holePatternKeys } from '../types';

export const holePatternQueryOptions = (id: string) =>
  queryOptions({
    queryKey: holePatternKeys.one(id),
    queryFn: () => answer(client.GET('/api/hole-patterns/{id}', { params: { path: { id } } })),
  });

export const useHolePattern = (id: string) => useQuery(holePatternQueryOptions(id));
