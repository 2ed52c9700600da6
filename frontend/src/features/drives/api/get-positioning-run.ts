import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { driveKeys } from '../types';

/** One run with its deviations and per-target results, as the result and its chart need it. */
export const positioningRunQueryOptions = (axisId: string, id: string) =>
  queryOptions({
    queryKey: [...driveKeys.runs(axisId), 'one', id],
    queryFn: () =>
      answer(client.GET('/api/axes/{id}/positioning-runs/{runId}', { params: { path: { id: axisId, runId: id } } })),
  });

/** The run `id` in full; idle while no run is chosen. */
export const usePositioningRun = (axisId: string, id: string | null) =>
  useQuery({ ...positioningRunQueryOptions(axisId, id ?? ''), enabled: !!id });
