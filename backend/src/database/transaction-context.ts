import { AsyncLocalStorage } from 'node:async_hooks';
import { sql } from 'drizzle-orm';
import { NodePgSession, NodePgTransaction } from 'drizzle-orm/node-postgres';
import type pg from 'pg';
import type { Database } from './database.tokens.js';
import { oneQueryAtATime } from './one-query-at-a-time.js';

/** Who a command runs for: the database's change log reads it back from transaction settings. */
export interface CommandActor {
  id: string | null;
  name: string;
  workshopId: string | null;
}

interface Frame {
  tx: Database;
  afterCommit: (() => void)[];
}

const storage = new AsyncLocalStorage<Frame>();

// PostgreSQL's serialization failure and deadlock: the whole command can safely run again.
const RETRYABLE = new Set(['40001', '40P01']);
const MAX_ATTEMPTS = 4;

export function isRetryable(err: unknown): boolean {
  const e = err as { code?: string; cause?: { code?: string } };
  return RETRYABLE.has(e?.code ?? '') || RETRYABLE.has(e?.cause?.code ?? '');
}

/**
 * One transaction per command. Repositories keep using the one injected database handle; while a
 * command runs, that handle is its transaction (see `transactionalDatabase`), so the record, its
 * audit row, its lock check and any state change commit together or not at all.
 */
export class TransactionContext {
  /**
   * With the pool, a command's transaction opens and names its actor in one round trip; without
   * it (unit specs with a stand-in database) through the database's own `transaction`.
   */
  constructor(
    private readonly root: Database,
    private readonly pool?: pg.Pool,
  ) {}

  /** The current command's transaction, or the pool outside one. */
  current(): Database {
    return storage.getStore()?.tx ?? this.root;
  }

  inTransaction(): boolean {
    return !!storage.getStore();
  }

  /**
   * Runs `work` in a transaction (joining the current one if there is one). A deadlock or
   * serialization failure reruns the whole command when `retry` allows it.
   */
  async run<T>(work: () => Promise<T>, options: { actor?: CommandActor; retry?: boolean } = {}): Promise<T> {
    if (storage.getStore()) return work();
    for (let attempt = 1; ; attempt++) {
      const frame: Frame = { tx: this.root, afterCommit: [] };
      try {
        const inFrame = (tx: Database) => {
          frame.tx = tx;
          return storage.run(frame, work);
        };
        const result = this.pool
          ? await this.pooledTransaction(this.pool, options.actor, inFrame)
          : await this.root.transaction(async (tx) => {
              if (options.actor) await setActor(tx as unknown as Database, options.actor);
              return inFrame(tx as unknown as Database);
            });
        for (const fn of frame.afterCommit) fn();
        return result;
      } catch (err) {
        if (options.retry !== false && attempt < MAX_ATTEMPTS && isRetryable(err)) continue;
        throw err;
      }
    }
  }

  /** Work that must only happen once the command has committed (mail, files); runs at once outside one. */
  afterCommit(fn: () => void): void {
    const frame = storage.getStore();
    if (frame) frame.afterCommit.push(fn);
    else fn();
  }

  /**
   * Drizzle's transaction on one pool client, opened by a single simple-protocol statement that
   * also sets the actor for the change log (`begin; select set_config(...)`): one round trip less
   * on every command. The actor's values go in as escaped literals.
   */
  private async pooledTransaction<T>(
    pool: pg.Pool,
    actor: CommandActor | undefined,
    work: (tx: Database) => Promise<T>,
  ): Promise<T> {
    const client = await pool.connect();
    const root = this.root as unknown as {
      dialect: ConstructorParameters<typeof NodePgSession>[1];
      session: { schema: never; options: object };
    };
    const session = new NodePgSession(oneQueryAtATime(client), root.dialect, root.session.schema, root.session.options);
    const tx = new NodePgTransaction(root.dialect, session, root.session.schema) as unknown as Database;
    // Set when the connection's state is unknown (begin, commit or rollback failed): it is dropped, not reused.
    let broken: Error | undefined;
    const control = (text: string) =>
      client.query(text).catch((err: Error) => {
        broken = err;
        throw err;
      });
    try {
      await control(actor ? `begin; ${actorStatement(client, actor)}` : 'begin');
      let result: T;
      try {
        result = await work(tx);
      } catch (err) {
        await control('rollback').catch(() => undefined);
        throw err;
      }
      await control('commit');
      return result;
    } finally {
      client.release(broken);
    }
  }

  /** Runs `work` on the pool, outside the current transaction: for what must stay even if the command fails. */
  outside<T>(work: () => Promise<T>): Promise<T> {
    return storage.exit(work);
  }
}

function actorStatement(client: pg.PoolClient, actor: CommandActor): string {
  const literal = (v: string) => client.escapeLiteral(v);
  return `select set_config('railwright.actor_id', ${literal(actor.id ?? '')}, true), set_config('railwright.actor_name', ${literal(actor.name)}, true), set_config('railwright.workshop_id', ${literal(actor.workshopId ?? '')}, true)`;
}

async function setActor(tx: Database, actor: CommandActor) {
  await tx.execute(
    sql`select set_config('railwright.actor_id', ${actor.id ?? ''}, true), set_config('railwright.actor_name', ${actor.name}, true), set_config('railwright.workshop_id', ${actor.workshopId ?? ''}, true)`,
  );
}

/**
 * The handle every repository injects: each property is looked up on the current transaction,
 * so code written against the pool runs inside the command's transaction without knowing it.
 */
export function transactionalDatabase(context: TransactionContext): Database {
  return new Proxy({} as Database, {
    get(_target, prop) {
      const db = context.current() as unknown as Record<string | symbol, unknown>;
      const value = db[prop];
      return typeof value === 'function' ? (value as (...a: unknown[]) => unknown).bind(db) : value;
    },
  });
}
