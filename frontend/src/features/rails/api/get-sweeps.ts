import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { railKeys, type SweepSummary } from '../types';

/** A sweep as the rail's list gives it: the summary, no readings (useSweep has them). */
export interface SweepListItem extends SweepSummary {
  railId: string;
  machineId: string;
  takenBy: string;
  stationCount: number;
  createdAt: string;
  locked: boolean;
}

export const SWEEP_PAGE_SIZE = 50;

/** Newest first, a page at a time; the next page starts after the last sweep of the one before. */
export const sweepsQueryOptions = (railId: string) =>
  infiniteQueryOptions({
    queryKey: railKeys.sweeps(railId),
    queryFn: ({ pageParam }) => api.get<SweepListItem[]>(`/rails/${railId}/sweeps?limit=${SWEEP_PAGE_SIZE}${pageParam ? `&cursor=${pageParam}` : ''}`),
    initialPageParam: '',
    getNextPageParam: (last) => (last.length === SWEEP_PAGE_SIZE ? last[last.length - 1].id : undefined),
    select: (data) => data.pages.flat(),
  });

export const useSweeps = (railId: string) => useInfiniteQuery(sweepsQueryOptions(railId));
