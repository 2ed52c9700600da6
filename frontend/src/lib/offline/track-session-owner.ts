import type { QueryClient, QueryKey } from '@tanstack/react-query';
import { hashKey } from '@tanstack/react-query';
import { setSessionOwner } from './session-owner';

/** Keeps session-owner.ts in step with the query that says who is signed in. */
export function trackSessionOwner(client: QueryClient, meKey: QueryKey): () => void {
  const hash = hashKey(meKey);
  const update = () => {
    const state = client.getQueryState<{ id: string; name: string } | null>(meKey);
    if (state?.status === 'success') setSessionOwner(state.data?.id ?? null, state.data?.name ?? '');
  };
  update();
  return client.getQueryCache().subscribe((event) => {
    if (event.query.queryHash === hash) update();
  });
}
