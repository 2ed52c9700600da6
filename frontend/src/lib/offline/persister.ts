import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import { del, get, set } from 'idb-keyval';

/**
 * The query cache and the entries waiting to be sent, kept in IndexedDB (structured clone, so a
 * photo waiting to be sent keeps its file). One store for the device; what is in it is checked
 * against the signed-in person before anything waiting is sent (session-owner.ts).
 */
export const persister = createAsyncStoragePersister({
  storage: { getItem: (key: string) => get(key), setItem: (key: string, value: unknown) => set(key, value), removeItem: (key: string) => del(key) },
  key: 'railwright.cache.v1',
  // IndexedDB stores objects as they are; no JSON round trip (which would lose files and dates).
  serialize: (client) => client as never,
  deserialize: (stored) => stored as never,
  // No pause between saves (still one at a time, each with the latest state): an entry typed
  // just before a reload or a closed tab must already be in IndexedDB. What is saved is small
  // (who is signed in and the entries not yet recorded), so saving on every change costs little.
  throttleTime: 0,
});

/** Keep a week: long enough for a weekend without a connection, short enough not to show stale data for long. */
export const PERSIST_MAX_AGE_MS = 7 * 24 * 3600_000;
