import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys, type SpeedCheck } from '../types';

export const speedCheckQueryOptions = (axisId: string) =>
  queryOptions({ queryKey: driveKeys.speed(axisId), queryFn: () => api.get<SpeedCheck>(`/axes/${axisId}/speed-check`) });

export const useSpeedCheck = (axisId: string) => useQuery(speedCheckQueryOptions(axisId));
