import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { mailKeys } from '../types';

export const outboxQueryOptions = () =>
  queryOptions({
    queryKey: mailKeys.outbox,
    queryFn: () => answer(client.GET('/api/dev/outbox')),
    staleTime: 0,
    refetchInterval: 5000,
  });

export const useOutbox = () => useQuery(outboxQueryOptions());
