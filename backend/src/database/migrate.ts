import { fileURLToPath } from 'node:url';
import path from 'node:path';
import { existsSync } from 'node:fs';
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import pg from 'pg';
import { ensureAppRole } from './app-role.js';
import { withAdvisoryLock } from './advisory-lock.js';

/** The top-level drizzle/ folder, found by walking up from this file (source or build). */
export function migrationsFolder(): string {
  let dir = path.dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 8; i++) {
    const candidate = path.join(dir, 'drizzle', 'meta', '_journal.json');
    if (existsSync(candidate)) return path.join(dir, 'drizzle');
    dir = path.dirname(dir);
  }
  throw new Error('The drizzle/ migrations folder was not found above ' + fileURLToPath(import.meta.url));
}

/**
 * Brings the database to the latest schema as its owner, then makes sure the role the application
 * connects as (the user of `appUrl`) may read and write records but never rewrite history. Several
 * instances starting together take turns: the first migrates, the others find nothing to do.
 */
export async function runMigrations(ownerUrl: string, appUrl: string = ownerUrl): Promise<void> {
  const pool = new pg.Pool({ connectionString: ownerUrl, max: 1 });
  try {
    await withAdvisoryLock(pool, 'migrations', async (client) => {
      await migrate(drizzle(client), { migrationsFolder: migrationsFolder() });
      await ensureAppRole(client, appUrl, ownerUrl);
    });
  } finally {
    await pool.end();
  }
}
