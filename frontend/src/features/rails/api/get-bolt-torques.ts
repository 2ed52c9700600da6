import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { railKeys } from '../types';

export const boltTorquesQueryOptions = () =>
  queryOptions({
    queryKey: railKeys.boltTorques(),
    queryFn: () => answer(client.GET('/api/rails/bolt-torques')),
    staleTime: Infinity,
  });

export const useBoltTorques = () => useQuery(boltTorquesQueryOptions());
