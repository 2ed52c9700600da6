// API specs share one throwaway database (made by scripts/test.sh); bring it to the latest schema.
// Plain JavaScript: jest loads global setup outside its module mapper.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';

export default async function globalSetup() {
  if (!process.env.DATABASE_URL) return; // engine-only runs need no database
  // With an owner of its own (npm test), the database was migrated as that owner before jest
  // started, and the application's role cannot change the schema.
  if (process.env.DATABASE_OWNER_URL) return;
  const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 1 });
  try {
    const folder = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../drizzle');
    await migrate(drizzle(pool), { migrationsFolder: folder });
  } finally {
    await pool.end();
  }
}
