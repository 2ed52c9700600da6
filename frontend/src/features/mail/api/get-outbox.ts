import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { mailKeys, type OutboxMessage } from '../types';

export const outboxQueryOptions = () =>
  queryOptions({ queryKey: mailKeys.outbox, queryFn: () => api.get<OutboxMessage[]>('/dev/outbox'), staleTime: 0, refetchInterval: 5000 });

export const useOutbox = () => useQuery(outboxQueryOptions());
