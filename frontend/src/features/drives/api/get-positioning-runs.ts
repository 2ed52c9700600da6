import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { AnswerOf } from '../../../lib/api/schemas';
import { driveKeys } from '../types';

/** A run as the axis's list gives it: the three figures and their verdicts, no deviations (usePositioningRun has them). */
export type PositioningRunListItem = AnswerOf<'/api/axes/{id}/positioning-runs', 'get'>[number];

export const RUN_PAGE_SIZE = 50;

/** Newest first, a page at a time; the next page starts after the last run of the one before. */
export const positioningRunsQueryOptions = (axisId: string) =>
  infiniteQueryOptions({
    queryKey: driveKeys.runs(axisId),
    queryFn: ({ pageParam }) =>
      answer(
        client.GET('/api/axes/{id}/positioning-runs', {
          params: {
            path: { id: axisId },
            query: { limit: RUN_PAGE_SIZE, ...(pageParam ? { cursor: pageParam } : {}) },
          },
        }),
      ),
    initialPageParam: '',
    getNextPageParam: (last) => (last.length === RUN_PAGE_SIZE ? last[last.length - 1].id : undefined),
    select: (data) => data.pages.flat(),
  });

export const usePositioningRuns = (axisId: string) => useInfiniteQuery(positioningRunsQueryOptions(axisId));
