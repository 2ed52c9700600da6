import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { boltDownKeys } from '../types';

export const boltTorquesQueryOptions = () =>
  queryOptions({
    queryKey: boltDownKeys.boltTorques(),
    queryFn: () => answer(client.GET('/api/rails/bolt-torques')),
    staleTime: Infinity,
  });

export const useBoltTorques = () => useQuery(boltTorquesQueryOptions());
