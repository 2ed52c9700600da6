import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { driveKeys } from '../types';

/** One trial with its moves and fit, as the result and its chart need it. */
export const travelTrialQueryOptions = (axisId: string, id: string) =>
  queryOptions({
    queryKey: [...driveKeys.trials(axisId), 'one', id],
    queryFn: () =>
      answer(client.GET('/api/axes/{id}/travel-trials/{trialId}', { params: { path: { id: axisId, trialId: id } } })),
  });

/** The trial `id` in full; idle while no trial is chosen. */
export const useTravelTrial = (axisId: string, id: string | null) =>
  useQuery({ ...travelTrialQueryOptions(axisId, id ?? ''), enabled: !!id });
