import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export interface TargetSetChoice {
  id: string;
  name: string;
  description: string;
}

// Same key as the target sets page, so both read one cached list.
export const targetSetChoicesQueryOptions = () =>
  queryOptions({ queryKey: ['target-sets', 'list'] as const, queryFn: () => api.get<TargetSetChoice[]>('/target-sets') });

/** The workshop's target sets, to pick one for a machine. */
export const useTargetSetChoices = () => useQuery(targetSetChoicesQueryOptions());
