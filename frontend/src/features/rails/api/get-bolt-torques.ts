import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { railKeys, type BoltTorques } from '../types';

export const boltTorquesQueryOptions = () =>
  queryOptions({ queryKey: railKeys.boltTorques(), queryFn: () => api.get<BoltTorques>('/rails/bolt-torques'), staleTime: Infinity });

export const useBoltTorques = () => useQuery(boltTorquesQueryOptions());
