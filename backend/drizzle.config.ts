import { defineConfig } from 'drizzle-kit';

export default defineConfig({
  dialect: 'postgresql',
  schema: './src/database/schema/index.ts',
  out: '../drizzle',
  // The session table belongs to the session store, not to our schema.
  tablesFilter: ['!session'],
});
