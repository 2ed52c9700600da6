import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { machineKeys } from '../../../lib/machine-keys';

export const machinesQueryOptions = () =>
  queryOptions({ queryKey: machineKeys.list(), queryFn: () => answer(client.GET('/api/machines')) });

export const useMachines = () => useQuery(machinesQueryOptions());
