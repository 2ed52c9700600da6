import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from '../../../lib/machine-keys';
import type { MachineListItem } from '../types';

export const machinesQueryOptions = () => queryOptions({ queryKey: machineKeys.list(), queryFn: () => api.get<MachineListItem[]>('/machines') });

export const useMachines = () => useQuery(machinesQueryOptions());
