import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { backlashKeys } from '../backlash-types';

export const BACKLASH_PAGE_SIZE = 50;

/** The axis's backlash checks, newest first, a page at a time. */
export const backlashChecksQueryOptions = (axisId: string) =>
  infiniteQueryOptions({
    queryKey: backlashKeys.list(axisId),
    queryFn: ({ pageParam }) =>
      answer(
        client.GET('/api/axes/{id}/backlash-checks', {
          params: { path: { id: axisId }, query: { limit: BACKLASH_PAGE_SIZE, cursor: pageParam || undefined } },
        }),
      ),
    initialPageParam: '',
    getNextPageParam: (last) => (last.length === BACKLASH_PAGE_SIZE ? last[last.length - 1].id : undefined),
    select: (data) => data.pages.flat(),
  });

export const useBacklashChecks = (axisId: string) => useInfiniteQuery(backlashChecksQueryOptions(axisId));
