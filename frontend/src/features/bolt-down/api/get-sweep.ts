import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boltDownKeys, type FinalSweepResult } from '../types';

export const finalSweepQueryOptions = (sweepId: string) =>
  queryOptions({ queryKey: [...boltDownKeys.all, 'sweep', sweepId], queryFn: () => api.get<FinalSweepResult['sweep']>(`/sweeps/${sweepId}`) });

export const useFinalSweep = (sweepId: string | null) => useQuery({ ...finalSweepQueryOptions(sweepId ?? ''), enabled: !!sweepId });
