import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { boltDownKeys } from '../types';

export const finalSweepQueryOptions = (sweepId: string) =>
  queryOptions({
    queryKey: [...boltDownKeys.all, 'sweep', sweepId],
    queryFn: () => answer(client.GET('/api/sweeps/{id}', { params: { path: { id: sweepId } } })),
  });

export const useFinalSweep = (sweepId: string | null) =>
  useQuery({ ...finalSweepQueryOptions(sweepId ?? ''), enabled: !!sweepId });
