import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { driveKeys } from '../types';

export const speedCheckQueryOptions = (axisId: string) =>
  queryOptions({
    queryKey: driveKeys.speed(axisId),
    queryFn: () => answer(client.GET('/api/axes/{id}/speed-check', { params: { path: { id: axisId } } })),
  });

export const useSpeedCheck = (axisId: string) => useQuery(speedCheckQueryOptions(axisId));
