import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { approvalKeys } from '../types';

export const driftQueryOptions = (machineId: string) =>
  queryOptions({
    queryKey: approvalKeys.drift(machineId),
    queryFn: () => answer(client.GET('/api/machines/{id}/drift', { params: { path: { id: machineId } } })),
  });

export const useDrift = (machineId: string, enabled = true) => useQuery({ ...driftQueryOptions(machineId), enabled });
