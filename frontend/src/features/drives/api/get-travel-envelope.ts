import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { driveKeys } from '../types';

export const travelEnvelopeQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: driveKeys.envelope(machineId),
    queryFn: () => answer(client.GET('/api/machines/{id}/travel-envelope', { params: { path: { id: machineId } } })),
  });

export const useTravelEnvelope = (machineId: string) => useQuery(travelEnvelopeQueryOptions(machineId));
