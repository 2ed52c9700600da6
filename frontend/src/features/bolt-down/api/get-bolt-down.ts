import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { boltDownKeys } from '../types';

// Another device may be fixing holes of the same rail: look again now and then.
const REFRESH_MS = 30_000;

export const boltDownQueryOptions = (id: string) =>
  queryOptions({
    queryKey: boltDownKeys.detail(id),
    queryFn: () => answer(client.GET('/api/bolt-downs/{id}', { params: { path: { id } } })),
    refetchInterval: REFRESH_MS,
  });

export const useBoltDown = (id: string | undefined) => useQuery({ ...boltDownQueryOptions(id ?? ''), enabled: !!id });
