import { runMigrations } from './migrate.js';

// `node migrate-cli.js`: migrations as DATABASE_OWNER_URL, the application's role for DATABASE_URL.
const appUrl = process.env.DATABASE_URL ?? '';
runMigrations(process.env.DATABASE_OWNER_URL || appUrl, appUrl).catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
