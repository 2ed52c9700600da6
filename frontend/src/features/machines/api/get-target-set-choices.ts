import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';

export type TargetSetChoice = Pick<Schemas['TargetSetResponse'], 'id' | 'name' | 'description'>;

// Same key as the target sets page, so both read one cached list.
export const targetSetChoicesQueryOptions = () =>
  queryOptions({ queryKey: ['target-sets', 'list'] as const, queryFn: () => answer(client.GET('/api/target-sets')) });

/** The workshop's target sets, to pick one for a machine. */
export const useTargetSetChoices = () => useQuery(targetSetChoicesQueryOptions());
