import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { backlashKeys, type BacklashCheck } from '../backlash-types';

export const BACKLASH_PAGE_SIZE = 50;

/** The axis's backlash checks, newest first, a page at a time. */
export const backlashChecksQueryOptions = (axisId: string) =>
  infiniteQueryOptions({
    queryKey: backlashKeys.list(axisId),
    queryFn: ({ pageParam }) => api.get<BacklashCheck[]>(`/axes/${axisId}/backlash-checks?limit=${BACKLASH_PAGE_SIZE}${pageParam ? `&cursor=${pageParam}` : ''}`),
    initialPageParam: '',
    getNextPageParam: (last) => (last.length === BACKLASH_PAGE_SIZE ? last[last.length - 1].id : undefined),
    select: (data) => data.pages.flat(),
  });

export const useBacklashChecks = (axisId: string) => useInfiniteQuery(backlashChecksQueryOptions(axisId));
