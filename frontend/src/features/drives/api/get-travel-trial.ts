import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys, type TravelTrial } from '../types';

/** One trial with its moves and fit, as the result and its chart need it. */
export const travelTrialQueryOptions = (axisId: string, id: string) =>
  queryOptions({
    queryKey: [...driveKeys.trials(axisId), 'one', id],
    queryFn: () => api.get<TravelTrial>(`/axes/${axisId}/travel-trials/${id}`),
  });

/** The trial `id` in full; idle while no trial is chosen. */
export const useTravelTrial = (axisId: string, id: string | null) =>
  useQuery({ ...travelTrialQueryOptions(axisId, id ?? ''), enabled: !!id });
