import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { peopleKeys } from '../types';

export const peopleQueryOptions = () =>
  queryOptions({ queryKey: peopleKeys.all, queryFn: () => answer(client.GET('/api/people')) });

export const usePeople = () => useQuery(peopleQueryOptions());
