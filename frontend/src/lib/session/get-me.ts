import { queryOptions, useQuery } from '@tanstack/react-query';
import { ApiError, sendTo } from '../api/fetch-json';
import type { AnswerOf } from '../api/schemas';
import type { User } from './user';

export const authKeys = { me: ['auth', 'me'] as const };

/** The signed-in user, or null when signed out (401 is an answer here, not an error). */
export async function getMe(): Promise<User | null> {
  try {
    // Through the plain transport: the sign-in page asks this and loads no more than it needs.
    return (await sendTo<AnswerOf<'/api/auth/me', 'get'>>('GET', '/auth/me')).user;
  } catch (e) {
    if (e instanceof ApiError && e.status === 401) return null;
    throw e;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: authKeys.me, queryFn: getMe, staleTime: 60_000 });

export const useMe = () => useQuery(meQueryOptions());
