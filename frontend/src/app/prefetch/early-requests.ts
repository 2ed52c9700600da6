import type { QueryClient } from '@tanstack/react-query';
import { matchPath } from 'react-router-dom';
import { meQueryOptions } from '../../lib/session/get-me';
import { paths } from '../../config/paths';
import { prefetchMachineFile } from './machine-file';

// Pages open to everyone that never ask who is signed in.
const PUBLIC_PAGES = [paths.setPassword, paths.forgotPassword, '/verify/:token'];

/**
 * The first requests of the page the app opens on, sent while the page's code is still loading
 * instead of after it has loaded and drawn (each page would otherwise wait for its code, then for
 * who is signed in, then for its own data). They fill the query cache under the page's own keys.
 */
export function startEarlyRequests(queryClient: QueryClient, { pathname, search }: Location) {
  if (PUBLIC_PAGES.some((p) => matchPath(p, pathname))) return;
  // Without a connection the page opens from what the device kept: a request made now would
  // only wait, and would stand in the cache as an empty answer ahead of the kept one.
  if (!navigator.onLine) return;
  void queryClient.prefetchQuery(meQueryOptions());
  const file = matchPath('/machines/:machineId', pathname);
  if (file?.params.machineId) {
    prefetchMachineFile(queryClient, file.params.machineId, new URLSearchParams(search).get('tab'));
  }
}
