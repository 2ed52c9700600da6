import connectPgSimple from 'connect-pg-simple';
import expressSession from 'express-session';
import type pg from 'pg';
import type { SessionUser } from '../auth/session-user.js';
import type { Role } from './schema/users.js';
import type { SessionCache } from './session-cache.js';

/**
 * The session key under which the store hands the guard the signed-in person it read together
 * with the session: `false` when the session names nobody who may still sign in. Never stored.
 */
export const LOADED_USER = 'loadedUser';

/** The signed-in person as handlers see them, and since when their sessions count. */
export interface LoadedSessionUser extends SessionUser {
  /** Sessions signed in before this moment (ms since the epoch) no longer count. */
  sessionsValidFrom: number;
}

// The session and the active person it names in one statement: every authenticated request
// needs both, and a second round trip per request was a fifth of a short read's cost.
const SESSION_WITH_USER = `
  select s.sess, s.expire, u.id, u.email, u.name, u.role, u.workshop_id, w.name as workshop_name, u.sessions_valid_from
  from "session" s
  left join users u on u.id = case when s.sess->>'userId' ~* '^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$' then (s.sess->>'userId')::uuid end
    and u.active
  left join workshops w on w.id = u.workshop_id
  where s.sid = $1 and s.expire >= to_timestamp($2)`;

interface Row {
  sess: Record<string, unknown> | string;
  expire: Date;
  id: string | null;
  email: string;
  name: string;
  role: Role;
  workshop_id: string;
  workshop_name: string;
  sessions_valid_from: Date;
}

type Callback = (err: unknown, value?: unknown) => void;
interface PgStoreBase {
  query(sql: string | { name: string; text: string }, params: unknown[], fn: (err: unknown, row?: Row) => void): void;
  set(sid: string, sess: Record<string, unknown>, fn?: Callback): void;
  destroy(sid: string, fn?: Callback): void;
}

/** Copy of the session data to store: everything but what was loaded beside it. */
function storable(sess: Record<string | symbol, unknown>): Record<string, unknown> {
  if (!(LOADED_USER in sess)) return sess as Record<string, unknown>;
  const copy: Record<string | symbol, unknown> = { ...sess };
  delete copy[LOADED_USER];
  // The cookie keeps its own serialisation (a Cookie object, not plain data).
  return copy as Record<string, unknown>;
}

/**
 * connect-pg-simple's store (table "session"), reading the session's person in the same
 * statement. Sessions are stored exactly as before; only what is read grows by the person.
 * What was read is kept a few seconds in `cache`, which forgets it on any change (session-cache.ts).
 */
export function createSessionStore(pool: pg.Pool, cache: SessionCache): unknown {
  const PgStore = connectPgSimple(expressSession as never) as unknown as new (options: object) => PgStoreBase;
  class SessionWithUserStore extends PgStore {
    get(sid: string, fn: Callback): void {
      const kept = cache.get(sid);
      if (kept) return fn(null, { ...kept.sess, [LOADED_USER]: kept.user });
      // Named: each connection parses and plans it once, not on every request.
      this.query(
        { name: 'session_with_user', text: SESSION_WITH_USER },
        [sid, Math.floor(Date.now() / 1000)],
        (err, row) => {
          if (err) return fn(err);
          if (!row) return fn(null);
          let sess: Record<string, unknown>;
          try {
            sess = typeof row.sess === 'string' ? (JSON.parse(row.sess) as Record<string, unknown>) : row.sess;
          } catch {
            return this.destroy(sid, fn);
          }
          const user: LoadedSessionUser | false = row.id
            ? {
                id: row.id,
                email: row.email,
                name: row.name,
                role: row.role,
                workshopId: row.workshop_id,
                workshopName: row.workshop_name,
                sessionsValidFrom: new Date(row.sessions_valid_from).getTime(),
              }
            : false;
          cache.put(sid, sess, user, new Date(row.expire).getTime());
          fn(null, { ...sess, [LOADED_USER]: user });
        },
      );
    }

    set(sid: string, sess: Record<string, unknown>, fn?: Callback): void {
      cache.forgetSession(sid);
      super.set(sid, storable(sess), (err, value) => {
        // Forgotten again once stored: a read while the write was under way may have kept the old one.
        cache.forgetSession(sid);
        fn?.(err, value);
      });
    }

    destroy(sid: string, fn?: Callback): void {
      cache.forgetSession(sid);
      super.destroy(sid, (err, value) => {
        cache.forgetSession(sid);
        fn?.(err, value);
      });
    }
  }
  return new SessionWithUserStore({ pool, createTableIfMissing: true, pruneSessionInterval: 60 * 15 });
}
