import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { driveKeys } from '../types';

export const axesQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: driveKeys.axes(machineId),
    queryFn: () => answer(client.GET('/api/machines/{id}/axes', { params: { path: { id: machineId } } })),
  });

export const useAxes = (machineId: string) => useQuery(axesQueryOptions(machineId));
