import { queryOptions, useQueries } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { railKeys, type Sweep } from '../types';

/** One sweep with its stations and fitted lines. */
export const sweepQueryOptions = (id: string) =>
  queryOptions({
    queryKey: [...railKeys.all, 'sweep', id],
    queryFn: () => answer(client.GET('/api/sweeps/{id}', { params: { path: { id } } })),
  });

/** The full sweeps of the ids given, in that order; those still loading are left out. */
export function useSweepsById(ids: string[]): Sweep[] {
  return useQueries({
    queries: ids.map(sweepQueryOptions),
    combine: (results) => results.flatMap((r) => (r.data ? [r.data] : [])),
  });
}
