import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import { del, get, set } from 'idb-keyval';

/**
 * The query cache and the entries waiting to be sent, kept in IndexedDB (structured clone, so a
 * photo waiting to be sent keeps its file). One store for the device; what is in it is checked
 * against the signed-in person before anything waiting is sent (session-owner.ts).
 */
const storage = { getItem: (key: string) => get(key), setItem: (key: string, value: unknown) => set(key, value), removeItem: (key: string) => del(key) };
const options = {
  storage,
  key: 'railwright.cache.v1',
  // IndexedDB stores objects as they are; no JSON round trip (which would lose files and dates).
  serialize: (client: unknown) => client as never,
  deserialize: (stored: unknown) => stored as never,
};

/** Saves what is kept at most once a second: pages' answers change often and are not precious. */
export const persister = createAsyncStoragePersister({ ...options, throttleTime: 1000 });

/**
 * Saves at once (still one save at a time, each with the latest state): used when an entry is
 * typed or changes state, so an entry typed just before a reload or a closed tab is already in
 * IndexedDB.
 */
export const persisterNow = createAsyncStoragePersister({ ...options, throttleTime: 0 });

/** Keep a week: long enough for a weekend without a connection, short enough not to show stale data for long. */
export const PERSIST_MAX_AGE_MS = 7 * 24 * 3600_000;
