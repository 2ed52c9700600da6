import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { boltDownKeys } from '../types';

/** Bolt-downs of a rail, latest first. */
export const boltDownsQueryOptions = (railId: string) =>
  queryOptions({
    queryKey: boltDownKeys.forRail(railId),
    queryFn: () => answer(client.GET('/api/rails/{id}/bolt-downs', { params: { path: { id: railId } } })),
  });

export const useBoltDowns = (railId: string) => useQuery(boltDownsQueryOptions(railId));
