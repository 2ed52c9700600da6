import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { evidenceKeys } from '../types';

export const evidenceLimitsQueryOptions = () =>
  queryOptions({
    queryKey: evidenceKeys.limits(),
    queryFn: () => answer(client.GET('/api/evidence/limits')),
    staleTime: Infinity,
  });

export const useEvidenceLimits = () => useQuery(evidenceLimitsQueryOptions());
