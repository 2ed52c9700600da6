import type { PersistedClient, Persister } from '@tanstack/react-query-persist-client';
import { del, get, set } from 'idb-keyval';

/**
 * What the device keeps, in IndexedDB (structured clone, so a photo waiting to be sent keeps its
 * file), in two parts:
 * - the entries not yet recorded and who is signed in: small, and written on every change, so an
 *   entry typed just before a reload or a closed tab is already kept;
 * - the pages' answers (lib/offline/kept-queries.ts): written at most once a second.
 * They are put back together when the app opens. What is in them is checked against the
 * signed-in person before anything waiting is sent (session-owner.ts).
 */
const ENTRIES_KEY = 'railwright.entries.v1';
const PAGES_KEY = 'railwright.pages.v1';
const PAGES_EVERY_MS = 1000;

type Query = PersistedClient['clientState']['queries'][number];
const isMe = (q: Query) => q.queryKey[0] === 'auth' && q.queryKey[1] === 'me';

let lastEntries = '';
let pages: PersistedClient | null = null;
let pagesTimer: ReturnType<typeof setTimeout> | undefined;

function writePagesSoon(client: PersistedClient) {
  pages = { ...client, clientState: { mutations: [], queries: client.clientState.queries.filter((q) => !isMe(q)) } };
  pagesTimer ??= setTimeout(() => {
    pagesTimer = undefined;
    const kept = pages;
    pages = null;
    if (kept) void set(PAGES_KEY, kept).catch(() => undefined);
  }, PAGES_EVERY_MS);
}

export const persister: Persister = {
  async persistClient(client) {
    const { mutations, queries } = client.clientState;
    const me = queries.filter(isMe);
    // Written again only when an entry or who is signed in changed (not on every page read).
    const mark = JSON.stringify([
      mutations.map((m) => [
        m.mutationKey,
        m.state.status,
        m.state.isPaused,
        m.state.submittedAt,
        m.state.failureCount,
      ]),
      me.map((q) => q.state.dataUpdatedAt),
    ]);
    writePagesSoon(client);
    if (mark === lastEntries) return;
    lastEntries = mark;
    await set(ENTRIES_KEY, { ...client, clientState: { mutations, queries: me } });
  },
  async restoreClient() {
    const [entries, kept] = await Promise.all([get<PersistedClient>(ENTRIES_KEY), get<PersistedClient>(PAGES_KEY)]);
    const base = entries ?? kept;
    if (!base) return undefined;
    return {
      ...base,
      clientState: {
        mutations: entries?.clientState.mutations ?? [],
        queries: [
          ...(entries?.clientState.queries ?? []),
          ...(kept?.buster === base.buster ? kept.clientState.queries : []),
        ],
      },
    };
  },
  async removeClient() {
    lastEntries = '';
    await Promise.all([del(ENTRIES_KEY), del(PAGES_KEY)]);
  },
};

/** Keep a week: long enough for a weekend without a connection, short enough not to show stale data for long. */
export const PERSIST_MAX_AGE_MS = 7 * 24 * 3600_000;
