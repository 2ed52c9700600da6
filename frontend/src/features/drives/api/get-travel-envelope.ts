import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys, type TravelEnvelope } from '../types';

export const travelEnvelopeQueryOptions = (machineId: string) =>
  queryOptions({ queryKey: driveKeys.envelope(machineId), queryFn: () => api.get<TravelEnvelope>(`/machines/${machineId}/travel-envelope`) });

export const useTravelEnvelope = (machineId: string) => useQuery(travelEnvelopeQueryOptions(machineId));
