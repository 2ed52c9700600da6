import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { railKeys, type SweepListItem } from '../types';

export type { SweepListItem };

export const SWEEP_PAGE_SIZE = 50;

/** Newest first, a page at a time; the next page starts after the last sweep of the one before. */
export const sweepsQueryOptions = (railId: string) =>
  infiniteQueryOptions({
    queryKey: railKeys.sweeps(railId),
    queryFn: async ({ pageParam }): Promise<SweepListItem[]> =>
      (await answer(
        client.GET('/api/rails/{id}/sweeps', {
          params: { path: { id: railId }, query: { limit: SWEEP_PAGE_SIZE, cursor: pageParam || undefined } },
        }),
      )) as SweepListItem[],
    initialPageParam: '',
    getNextPageParam: (last) => (last.length === SWEEP_PAGE_SIZE ? last[last.length - 1].id : undefined),
    select: (data) => data.pages.flat(),
  });

export const useSweeps = (railId: string) => useInfiniteQuery(sweepsQueryOptions(railId));
