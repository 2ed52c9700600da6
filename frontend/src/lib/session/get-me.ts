import { queryOptions, useQuery } from '@tanstack/react-query';
import { ApiError, answer, client } from '../api-client';
import type { User } from './user';

export const authKeys = { me: ['auth', 'me'] as const };

/** The signed-in user, or null when signed out (401 is an answer here, not an error). */
export async function getMe(): Promise<User | null> {
  try {
    return (await answer(client.GET('/api/auth/me'))).user;
  } catch (e) {
    if (e instanceof ApiError && e.status === 401) return null;
    throw e;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: authKeys.me, queryFn: getMe, staleTime: 60_000 });

export const useMe = () => useQuery(meQueryOptions());
