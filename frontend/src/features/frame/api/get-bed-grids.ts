import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { frameKeys, type BedGrid } from '../types';

export const bedGridsQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: frameKeys.bedGrids(machineId),
    queryFn: () => api.get<BedGrid[]>(`/machines/${machineId}/bed-grids`),
  });

export const useBedGrids = (machineId: string) => useQuery(bedGridsQueryOptions(machineId));
