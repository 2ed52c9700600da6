import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys, type PositioningRun } from '../types';

export const positioningRunsQueryOptions = (axisId: string) =>
  queryOptions({ queryKey: driveKeys.runs(axisId), queryFn: () => api.get<PositioningRun[]>(`/axes/${axisId}/positioning-runs`) });

export const usePositioningRuns = (axisId: string) => useQuery(positioningRunsQueryOptions(axisId));
