import { onlineManager, useMutation, useQueryClient } from '@tanstack/react-query';
import { ApiError, client } from '../../../lib/api-client';
import type { QueryClient } from '@tanstack/react-query';
import { authKeys } from '../../../lib/session/get-me';

/**
 * Signing out needs the server (the session lives there): without a connection the person stays
 * signed in and is told so, rather than seeing a signed-out screen while the session goes on.
 */
export function useLogout() {
  const qc = useQueryClient();
  return useMutation({
    networkMode: 'always',
    mutationFn: async () => {
      if (!onlineManager.isOnline())
        throw new ApiError(
          0,
          'You are offline: signing out needs the connection. Entries you typed stay on this device and are sent when it returns.',
        );
      await client.POST('/api/auth/logout');
    },
    onSuccess: () => signedOut(qc),
    // Already signed out on the server (401): the screen follows.
    onError: (error) => error instanceof ApiError && error.status === 401 && signedOut(qc),
  });
}

/**
 * What the last person saw goes; entries still waiting to be sent stay (each with its author).
 * "Who is signed in" is set, not removed, so every screen watching it follows at once.
 */
export function signedOut(qc: QueryClient) {
  qc.setQueryData(authKeys.me, null);
  qc.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.me[0] || q.queryKey[1] !== authKeys.me[1] });
}
