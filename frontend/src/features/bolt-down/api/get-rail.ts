import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boltDownKeys, type RailSummary } from '../types';

export const railSummaryQueryOptions = (railId: string) =>
  queryOptions({ queryKey: boltDownKeys.rail(railId), queryFn: () => api.get<RailSummary>(`/rails/${railId}`) });

export const useRailSummary = (railId: string) => useQuery(railSummaryQueryOptions(railId));
