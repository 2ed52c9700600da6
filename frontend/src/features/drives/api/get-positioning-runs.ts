import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LengthUnit } from '../../../lib/units';
import { driveKeys, type PositioningRun, type ResultWarning } from '../types';

/** A run as the axis's list gives it: the three figures and their verdicts, no deviations (usePositioningRun has them). */
export interface PositioningRunListItem {
  id: string;
  axisId: string;
  lengthUnit: LengthUnit;
  readingUnit: LengthUnit;
  /** Kept with the record: what a person should know about the result. */
  warnings: ResultWarning[];
  targetCount: number;
  runCount: number;
  /** null when the stored result cannot be read (then `unreadable` says so). */
  result: Pick<NonNullable<PositioningRun['result']>, 'accuracy' | 'repeatability' | 'reversal'> | null;
  checks: PositioningRun['checks'] | null;
  unreadable?: string;
  status: PositioningRun['status'];
  recordedBy: string;
  recordedAt: string;
  locked: boolean;
}

export const RUN_PAGE_SIZE = 50;

/** Newest first, a page at a time; the next page starts after the last run of the one before. */
export const positioningRunsQueryOptions = (axisId: string) =>
  infiniteQueryOptions({
    queryKey: driveKeys.runs(axisId),
    queryFn: ({ pageParam }) =>
      api.get<PositioningRunListItem[]>(
        `/axes/${axisId}/positioning-runs?limit=${RUN_PAGE_SIZE}${pageParam ? `&cursor=${pageParam}` : ''}`,
      ),
    initialPageParam: '',
    getNextPageParam: (last) => (last.length === RUN_PAGE_SIZE ? last[last.length - 1].id : undefined),
    select: (data) => data.pages.flat(),
  });

export const usePositioningRuns = (axisId: string) => useInfiniteQuery(positioningRunsQueryOptions(axisId));
