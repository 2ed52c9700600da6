import 'reflect-metadata';
import { loadConfig } from './config/config.js';
import { runMigrations } from './database/migrate.js';
import { createApp } from './create-app.js';
import { seedDemoOnce } from './seed/seed-demo-once.js';

async function main() {
  const config = loadConfig();
  await runMigrations(config.databaseOwnerUrl ?? config.databaseUrl, config.databaseUrl);
  const app = await createApp(process.env);
  app.enableShutdownHooks();
  if (process.env.RAILWRIGHT_SEED !== 'off') await seedDemoOnce(app);
  await app.listen({ port: config.port, host: config.host });
  console.log(`Railwright is serving on ${config.appUrl}`);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
