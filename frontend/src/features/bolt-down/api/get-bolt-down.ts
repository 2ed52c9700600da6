import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boltDownKeys, type BoltDown } from '../types';

// Another device may be fixing holes of the same rail: look again now and then.
const REFRESH_MS = 30_000;

export const boltDownQueryOptions = (id: string) =>
  queryOptions({ queryKey: boltDownKeys.detail(id), queryFn: () => api.get<BoltDown>(`/bolt-downs/${id}`), refetchInterval: REFRESH_MS });

export const useBoltDown = (id: string | undefined) => useQuery({ ...boltDownQueryOptions(id ?? ''), enabled: !!id });
