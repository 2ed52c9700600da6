import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { targetSetKeys } from '../types';

export const targetSetsQueryOptions = () =>
  queryOptions({ queryKey: targetSetKeys.list(), queryFn: () => answer(client.GET('/api/target-sets')) });

export const useTargetSets = () => useQuery(targetSetsQueryOptions());
