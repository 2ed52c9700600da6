import type { INestApplicationContext } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import type pg from 'pg';
import { DRIZZLE, PG_POOL, type Database } from '../database/database.tokens.js';
import { withAdvisoryLock } from '../database/advisory-lock.js';
import { runDemoSeed } from '../../../seed/index.js';

/**
 * Seeds the invented demo workshops the first time the database is empty, and never again:
 * a later start keeps whatever people have recorded.
 */
export async function seedDemoOnce(app: INestApplicationContext): Promise<boolean> {
  const db = app.get<Database>(DRIZZLE);
  // Two instances starting on an empty database: the second waits, then finds it seeded.
  return withAdvisoryLock(app.get<pg.Pool>(PG_POOL), 'seed', async () => {
    const { rows } = await db.execute<{ n: number }>(sql`select count(*)::int as n from workshops`);
    if (rows[0].n > 0) return false;
    await runDemoSeed(app);
    console.log('Seeded the demo workshop.');
    return true;
  });
}
