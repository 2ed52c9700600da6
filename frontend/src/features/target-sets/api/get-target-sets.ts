import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { targetSetKeys, type TargetSet } from '../types';

export const targetSetsQueryOptions = () => queryOptions({ queryKey: targetSetKeys.list(), queryFn: () => api.get<TargetSet[]>('/target-sets') });

export const useTargetSets = () => useQuery(targetSetsQueryOptions());
