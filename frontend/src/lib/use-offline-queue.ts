import { useSyncExternalStore } from 'react';
import { offlineQueue, type QueuedWrite, type RefusedWrite } from './offline-queue';

export interface OfflineQueueState {
  /** Writes kept in the browser, oldest first, waiting to be sent. */
  pending: readonly QueuedWrite[];
  /** Waiting writes the server refused when they were finally sent. */
  refused: readonly RefusedWrite[];
  /** False while the last attempt failed for want of a connection. */
  reachable: boolean;
  retryNow: () => void;
  dismissRefused: (id?: string) => void;
}

/**
 * The waiting writes of the offline queue (see offline-queue.ts), live. Pass `pathPrefix` to see
 * only one record's writes, e.g. `/bolt-downs/${id}/` to mark the holes that are waiting.
 */
export function useOfflineQueue(pathPrefix?: string): OfflineQueueState {
  const snapshot = useSyncExternalStore(offlineQueue.subscribe, offlineQueue.getSnapshot);
  const keep = <W extends QueuedWrite>(list: readonly W[]) => (pathPrefix ? list.filter((w) => w.path.startsWith(pathPrefix)) : list);
  return {
    pending: keep(snapshot.pending),
    refused: keep(snapshot.refused),
    reachable: snapshot.reachable,
    retryNow: () => offlineQueue.retryNow(),
    dismissRefused: (id) => offlineQueue.dismissRefused(id),
  };
}
