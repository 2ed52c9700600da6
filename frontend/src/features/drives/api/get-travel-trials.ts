import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LengthUnit } from '../../../lib/units';
import { driveKeys, type TargetValue, type TravelTrial, type ResultWarning } from '../types';

/** A trial as the axis's list gives it: the headline figures, no moves (useTravelTrial has them). */
export interface TravelTrialListItem {
  id: string;
  axisId: string;
  lengthUnit: LengthUnit;
  readingUnit: LengthUnit;
  /** Kept with the record: what a person should know about the result. */
  warnings: ResultWarning[];
  stepsPerMmUsed: number;
  throughOrigin: boolean;
  moveCount: number;
  /** null when the stored result cannot be read (then `unreadable` says so). */
  result: Pick<
    NonNullable<TravelTrial['result']>,
    'correctedStepsPerMm' | 'errorPercent' | 'scale' | 'offset' | 'residualMax'
  > | null;
  unreadable?: string;
  status: TravelTrial['status'];
  target: TargetValue;
  recordedBy: string;
  recordedAt: string;
  appliedAt: string | null;
  appliedBy: string | null;
  locked: boolean;
}

export const TRIAL_PAGE_SIZE = 50;

/** Newest first, a page at a time; the next page starts after the last trial of the one before. */
export const travelTrialsQueryOptions = (axisId: string) =>
  infiniteQueryOptions({
    queryKey: driveKeys.trials(axisId),
    queryFn: ({ pageParam }) =>
      api.get<TravelTrialListItem[]>(
        `/axes/${axisId}/travel-trials?limit=${TRIAL_PAGE_SIZE}${pageParam ? `&cursor=${pageParam}` : ''}`,
      ),
    initialPageParam: '',
    getNextPageParam: (last) => (last.length === TRIAL_PAGE_SIZE ? last[last.length - 1].id : undefined),
    select: (data) => data.pages.flat(),
  });

export const useTravelTrials = (axisId: string) => useInfiniteQuery(travelTrialsQueryOptions(axisId));
