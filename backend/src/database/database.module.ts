import { Global, Inject, Module, OnApplicationShutdown } from '@nestjs/common';
import { drizzle } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import { ConfigService } from '@nestjs/config';
import type { RailwrightConfig } from '../config/app-config.module.js';
import * as schema from './schema/index.js';
import { DRIZZLE, PG_POOL, ROOT_DRIZZLE } from './database.tokens.js';
import { TransactionContext, transactionalDatabase } from './transaction-context.js';
import { CommandKeys } from './command-keys.js';
import { CommandKeysRepository } from './command-keys.repository.js';
import { SessionCache } from './session-cache.js';
import { prepareRepeatedStatements } from './prepared-statements.js';
import { SessionChangesListener } from './session-changes.listener.js';

@Global()
@Module({
  providers: [
    {
      provide: PG_POOL,
      inject: [ConfigService],
      useFactory: (config: ConfigService<RailwrightConfig, true>) => {
        // Connections are kept five minutes when idle, not node-postgres's ten seconds: a new one
        // costs a connection set-up, and its first statements are planned again with the
        // database process's caches cold (tens of ms on the first request after a pause).
        const pool = new pg.Pool({
          connectionString: config.get('app', { infer: true }).databaseUrl,
          max: 10,
          idleTimeoutMillis: 5 * 60_000,
        });
        // An idle connection dropped by the server must not take the process down; the pool reconnects.
        pool.on('error', (err) => console.error(`Database connection lost: ${err.message}`));
        pool.on('connect', (client) => prepareRepeatedStatements(client));
        return pool;
      },
    },
    {
      provide: ROOT_DRIZZLE,
      inject: [PG_POOL],
      useFactory: (pool: pg.Pool) => drizzle(pool, { schema }),
    },
    {
      provide: TransactionContext,
      inject: [ROOT_DRIZZLE, PG_POOL],
      useFactory: (root: ReturnType<typeof drizzle<typeof schema>>, pool: pg.Pool) =>
        new TransactionContext(root, pool),
    },
    {
      provide: DRIZZLE,
      inject: [TransactionContext],
      useFactory: (context: TransactionContext) => transactionalDatabase(context),
    },
    CommandKeysRepository,
    CommandKeys,
    { provide: SessionCache, useFactory: () => new SessionCache() },
    SessionChangesListener,
  ],
  exports: [PG_POOL, DRIZZLE, ROOT_DRIZZLE, TransactionContext, CommandKeys, SessionCache],
})
export class DatabaseModule implements OnApplicationShutdown {
  constructor(@Inject(PG_POOL) private readonly pool: pg.Pool) {}

  async onApplicationShutdown() {
    await this.pool.end();
  }
}
