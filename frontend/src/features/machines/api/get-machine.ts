import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from '../../../lib/machine-keys';
import type { Machine } from '../types';

export const machineQueryOptions = (id: string) => queryOptions({ queryKey: machineKeys.detail(id), queryFn: () => api.get<Machine>(`/machines/${id}`) });

export const useMachine = (id: string) => useQuery(machineQueryOptions(id));
