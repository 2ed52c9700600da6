import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys, type TravelTrial } from '../types';

export const travelTrialsQueryOptions = (axisId: string) =>
  queryOptions({ queryKey: driveKeys.trials(axisId), queryFn: () => api.get<TravelTrial[]>(`/axes/${axisId}/travel-trials`) });

export const useTravelTrials = (axisId: string) => useQuery(travelTrialsQueryOptions(axisId));
