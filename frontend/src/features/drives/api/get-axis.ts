import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { driveKeys } from '../types';

export const axisQueryOptions = (axisId: string) =>
  queryOptions({
    queryKey: driveKeys.axis(axisId),
    queryFn: () => answer(client.GET('/api/axes/{id}', { params: { path: { id: axisId } } })),
  });

export const useAxis = (axisId: string) => useQuery(axisQueryOptions(axisId));
