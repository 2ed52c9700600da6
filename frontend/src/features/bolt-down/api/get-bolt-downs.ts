import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boltDownKeys, type BoltDown } from '../types';

/** Bolt-downs of a rail, latest first. */
export const boltDownsQueryOptions = (railId: string) =>
  queryOptions({ queryKey: boltDownKeys.forRail(railId), queryFn: () => api.get<BoltDown[]>(`/rails/${railId}/bolt-downs`) });

export const useBoltDowns = (railId: string) => useQuery(boltDownsQueryOptions(railId));
