import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys, type PositioningRun } from '../types';

/** One run with its deviations and per-target results, as the result and its chart need it. */
export const positioningRunQueryOptions = (axisId: string, id: string) =>
  queryOptions({
    queryKey: [...driveKeys.runs(axisId), 'one', id],
    queryFn: () => api.get<PositioningRun>(`/axes/${axisId}/positioning-runs/${id}`),
  });

/** The run `id` in full; idle while no run is chosen. */
export const usePositioningRun = (axisId: string, id: string | null) =>
  useQuery({ ...positioningRunQueryOptions(axisId, id ?? ''), enabled: !!id });
