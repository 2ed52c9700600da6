import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { boltDownKeys, type RailSummary } from '../types';

export const railSummaryQueryOptions = (railId: string) =>
  queryOptions({
    queryKey: boltDownKeys.rail(railId),
    queryFn: (): Promise<RailSummary> => answer(client.GET('/api/rails/{id}', { params: { path: { id: railId } } })),
  });

export const useRailSummary = (railId: string) => useQuery(railSummaryQueryOptions(railId));
