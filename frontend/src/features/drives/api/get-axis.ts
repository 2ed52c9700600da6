import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys, type Axis } from '../types';

export const axisQueryOptions = (axisId: string) => queryOptions({ queryKey: driveKeys.axis(axisId), queryFn: () => api.get<Axis>(`/axes/${axisId}`) });

export const useAxis = (axisId: string) => useQuery(axisQueryOptions(axisId));
