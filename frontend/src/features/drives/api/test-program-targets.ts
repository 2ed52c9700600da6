import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { driveKeys } from '../types';

/** GET /api/axes/:id/test-targets: the targets the repeat-and-reverse program reads at. */
export type TestTargets = Schemas['TestTargets'];

export const testTargetsQueryOptions = (axisId: string) =>
  queryOptions({
    queryKey: [...driveKeys.axis(axisId), 'test-targets'] as const,
    queryFn: () => answer(client.GET('/api/axes/{id}/test-targets', { params: { path: { id: axisId } } })),
  });

export const useTestTargets = (axisId: string) => useQuery(testTargetsQueryOptions(axisId));
