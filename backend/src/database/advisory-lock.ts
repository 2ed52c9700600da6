import type pg from 'pg';

// One number per kind of start-up work, shared by every instance on the database.
const LOCKS = { migrations: 7_311_001, seed: 7_311_002 } as const;

/**
 * Runs `work` while holding a PostgreSQL session advisory lock on one pooled connection, so two
 * instances starting at once run it one after the other instead of racing.
 */
export async function withAdvisoryLock<T>(
  pool: pg.Pool,
  name: keyof typeof LOCKS,
  work: (client: pg.PoolClient) => Promise<T>,
): Promise<T> {
  const client = await pool.connect();
  try {
    await client.query('select pg_advisory_lock($1)', [LOCKS[name]]);
    try {
      return await work(client);
    } finally {
      await client.query('select pg_advisory_unlock($1)', [LOCKS[name]]);
    }
  } finally {
    client.release();
  }
}
