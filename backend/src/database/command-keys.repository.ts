import { Inject, Injectable } from '@nestjs/common';
import { and, eq, lt, sql } from 'drizzle-orm';
import { DRIZZLE, type Database } from './database.tokens.js';
import { commandKeys } from './schema/index.js';

export interface StoredCommand {
  userId: string;
  method: string;
  path: string;
  response: unknown;
}

/** The only SQL of command keys; runs in the command's transaction (see CommandKeys). */
@Injectable()
export class CommandKeysRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  /**
   * Claims the key for this command. A parallel sending of the same key waits here on the key's
   * row until the first commits (then finds it taken) or rolls back (then claims it).
   */
  async claim(key: string, userId: string, method: string, path: string): Promise<boolean> {
    const rows = await this.db
      .insert(commandKeys)
      .values({ key, userId, method, path })
      .onConflictDoNothing()
      .returning({ key: commandKeys.key });
    return rows.length === 1;
  }

  async find(key: string): Promise<StoredCommand | null> {
    const [row] = await this.db
      .select({
        userId: commandKeys.userId,
        method: commandKeys.method,
        path: commandKeys.path,
        response: commandKeys.response,
      })
      .from(commandKeys)
      .where(eq(commandKeys.key, key));
    return row ?? null;
  }

  async keepAnswer(key: string, response: unknown): Promise<void> {
    await this.db
      .update(commandKeys)
      .set({ response: response === undefined ? null : sql`${JSON.stringify(response)}::jsonb` })
      .where(eq(commandKeys.key, key));
  }

  async forgetOlderThan(days: number): Promise<void> {
    await this.db
      .delete(commandKeys)
      .where(and(lt(commandKeys.createdAt, sql`now() - make_interval(days => ${days})`)));
  }
}
