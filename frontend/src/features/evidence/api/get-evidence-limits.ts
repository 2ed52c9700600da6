import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { evidenceKeys, type EvidenceLimits } from '../types';

export const evidenceLimitsQueryOptions = () =>
  queryOptions({ queryKey: evidenceKeys.limits(), queryFn: () => api.get<EvidenceLimits>('/evidence/limits'), staleTime: Infinity });

export const useEvidenceLimits = () => useQuery(evidenceLimitsQueryOptions());
