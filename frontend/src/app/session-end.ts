import type { QueryClient, QueryKey } from '@tanstack/react-query';
import { ApiError } from '../lib/api/fetch-json';

/**
 * A read answered 401 means the session ended on the server (expired, signed out elsewhere, the
 * password changed): the app then knows nobody is signed in, so the sign-in page shows its form
 * rather than trusting a remembered "signed in".
 */
export function followSessionEnd(client: QueryClient, meKey: QueryKey): () => void {
  return client.getQueryCache().subscribe((event) => {
    if (event.type !== 'updated' || event.action.type !== 'error') return;
    const error = event.action.error;
    if (error instanceof ApiError && error.status === 401 && client.getQueryData(meKey))
      client.setQueryData(meKey, null);
  });
}
