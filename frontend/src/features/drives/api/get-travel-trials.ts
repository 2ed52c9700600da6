import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { AnswerOf } from '../../../lib/api/schemas';
import { driveKeys } from '../types';

/** A trial as the axis's list gives it: the headline figures, no moves (useTravelTrial has them). */
export type TravelTrialListItem = AnswerOf<'/api/axes/{id}/travel-trials', 'get'>[number];

export const TRIAL_PAGE_SIZE = 50;

/** Newest first, a page at a time; the next page starts after the last trial of the one before. */
export const travelTrialsQueryOptions = (axisId: string) =>
  infiniteQueryOptions({
    queryKey: driveKeys.trials(axisId),
    queryFn: ({ pageParam }) =>
      answer(
        client.GET('/api/axes/{id}/travel-trials', {
          params: {
            path: { id: axisId },
            query: { limit: TRIAL_PAGE_SIZE, ...(pageParam ? { cursor: pageParam } : {}) },
          },
        }),
      ),
    initialPageParam: '',
    getNextPageParam: (last) => (last.length === TRIAL_PAGE_SIZE ? last[last.length - 1].id : undefined),
    select: (data) => data.pages.flat(),
  });

export const useTravelTrials = (axisId: string) => useInfiniteQuery(travelTrialsQueryOptions(axisId));
