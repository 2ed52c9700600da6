import type { LoadedSessionUser } from './session-store.js';

/** The channel the database's triggers announce changed sessions, people and workshops on. */
export const SESSION_CHANGES_CHANNEL = 'railwright_session_changes';

interface Entry {
  /** The stored session as read (JSON), parsed afresh for each request so none can change another's copy. */
  sess: string;
  user: LoadedSessionUser | false;
  /** When this entry stops counting (ms since the epoch): the cache's lifetime or the session's expiry, whichever comes first. */
  until: number;
}

export interface CachedSession {
  sess: Record<string, unknown>;
  user: LoadedSessionUser | false;
}

/**
 * The sessions read recently, with the person each names, so that an authenticated request does
 * not read its session again on every call (one statement in two on the machines list).
 *
 * An entry is forgotten when the session is stored or ended here, when the person or workshop
 * changes in a command of this server (after it commits), and when the database announces a change
 * made anywhere else (triggers on `session`, `users` and `workshops` notify the channel above). It
 * serves nothing while that announcement is not being listened to, and no entry outlives `ttlMs`,
 * so a change whose announcement was lost still counts within that time.
 */
export class SessionCache {
  private readonly entries = new Map<string, Entry>();
  private listening = false;

  constructor(
    private readonly ttlMs = 5_000,
    private readonly maxEntries = 10_000,
    private readonly now: () => number = Date.now,
  ) {}

  /** Whether the database's change announcements are being heard (entries are served only then). */
  setListening(listening: boolean): void {
    this.listening = listening;
    if (!listening) this.entries.clear();
  }

  get isListening(): boolean {
    return this.listening;
  }

  get(sid: string): CachedSession | undefined {
    if (!this.listening) return undefined;
    const entry = this.entries.get(sid);
    if (!entry) return undefined;
    if (entry.until <= this.now()) {
      this.entries.delete(sid);
      return undefined;
    }
    return { sess: JSON.parse(entry.sess) as Record<string, unknown>, user: entry.user };
  }

  /** Keeps a session as just read; `expiresAt` is the stored session's own expiry (ms since the epoch). */
  put(sid: string, sess: Record<string, unknown>, user: LoadedSessionUser | false, expiresAt: number): void {
    if (!this.listening) return;
    // The oldest entry goes first when full (a Map keeps the order entries were added in).
    if (this.entries.size >= this.maxEntries) this.entries.delete(this.entries.keys().next().value as string);
    this.entries.set(sid, { sess: JSON.stringify(sess), user, until: Math.min(this.now() + this.ttlMs, expiresAt) });
  }

  forgetSession(sid: string): void {
    this.entries.delete(sid);
  }

  forgetPerson(userId: string): void {
    // A session naming nobody (false) may name this person once they can sign in again.
    for (const [sid, e] of this.entries) if (e.user === false || e.user.id === userId) this.entries.delete(sid);
  }

  forgetWorkshop(workshopId: string): void {
    for (const [sid, e] of this.entries) if (!e.user || e.user.workshopId === workshopId) this.entries.delete(sid);
  }

  clear(): void {
    this.entries.clear();
  }

  get size(): number {
    return this.entries.size;
  }

  /** Acts on one announcement from the database: "session:<sid>", "person:<id>" or "workshop:<id>". */
  announced(payload: string): void {
    const colon = payload.indexOf(':');
    const kind = payload.slice(0, colon);
    const id = payload.slice(colon + 1);
    if (kind === 'session') this.forgetSession(id);
    else if (kind === 'person') this.forgetPerson(id);
    else if (kind === 'workshop') this.forgetWorkshop(id);
    else if (kind !== 'mark') this.clear();
  }
}
