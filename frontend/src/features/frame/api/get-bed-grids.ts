import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { frameKeys } from '../types';

export const bedGridsQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: frameKeys.bedGrids(machineId),
    queryFn: () => answer(client.GET('/api/machines/{id}/bed-grids', { params: { path: { id: machineId } } })),
  });

export const useBedGrids = (machineId: string) => useQuery(bedGridsQueryOptions(machineId));
