import { queryOptions, useQuery } from '@tanstack/react-query';
import { answer, ApiError, client } from '../../../lib/api-client';
import { verificationKeys } from '../types';

export const verificationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: verificationKeys.byToken(token),
    queryFn: () => answer(client.GET('/api/public/verify/{token}', { params: { path: { token } } })),
    // An unknown address stays unknown: no retries.
    retry: (count, error) => !(error instanceof ApiError && error.status === 404) && count < 2,
  });

export const useVerification = (token: string) => useQuery(verificationQueryOptions(token));
