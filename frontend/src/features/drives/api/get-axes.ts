import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys, type AxisListItem } from '../types';

export const axesQueryOptions = (machineId: string) =>
  queryOptions({ queryKey: driveKeys.axes(machineId), queryFn: () => api.get<AxisListItem[]>(`/machines/${machineId}/axes`) });

export const useAxes = (machineId: string) => useQuery(axesQueryOptions(machineId));
