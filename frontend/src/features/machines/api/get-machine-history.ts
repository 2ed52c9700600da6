import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys, type HistoryEntry } from '../types';

export const machineHistoryQueryOptions = (id: string) =>
  queryOptions({ queryKey: machineKeys.history(id), queryFn: () => api.get<HistoryEntry[]>(`/machines/${id}/history`) });

export const useMachineHistory = (id: string) => useQuery(machineHistoryQueryOptions(id));
