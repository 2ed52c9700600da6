import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { railKeys, type RailListItem } from '../types';

export const railsQueryOptions = (machineId: string) =>
  queryOptions({ queryKey: railKeys.list(machineId), queryFn: () => api.get<RailListItem[]>(`/machines/${machineId}/rails`) });

export const useRails = (machineId: string) => useQuery(railsQueryOptions(machineId));
