import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, ApiError } from '../../../lib/api-client';
import { verificationKeys, type PublicVerification } from '../types';

export const verificationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: verificationKeys.byToken(token),
    queryFn: () => api.get<PublicVerification>(`/public/verify/${encodeURIComponent(token)}`),
    // An unknown address stays unknown: no retries.
    retry: (count, error) => !(error instanceof ApiError && error.status === 404) && count < 2,
  });

export const useVerification = (token: string) => useQuery(verificationQueryOptions(token));
