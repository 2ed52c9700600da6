import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { machineKeys } from '../../../lib/machine-keys';

export const machineQueryOptions = (id: string) =>
  queryOptions({
    queryKey: machineKeys.detail(id),
    queryFn: () => answer(client.GET('/api/machines/{id}', { params: { path: { id } } })),
  });

export const useMachine = (id: string) => useQuery(machineQueryOptions(id));
