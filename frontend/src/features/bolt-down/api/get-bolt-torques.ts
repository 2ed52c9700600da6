import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boltDownKeys } from '../types';

export interface BoltTorqueTable {
  bolts: { boltSize: string; torqueNm: number }[];
  source: string;
}

export const boltTorquesQueryOptions = () =>
  queryOptions({ queryKey: boltDownKeys.boltTorques(), queryFn: () => api.get<BoltTorqueTable>('/rails/bolt-torques'), staleTime: Infinity });

export const useBoltTorques = () => useQuery(boltTorquesQueryOptions());
