import { index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { users } from './users.js';

/**
 * The client-made key of each command sent with one (`Idempotency-Key`), kept with the answer it
 * got: an entry queued on a tablet without a connection may be sent twice (the first answer lost
 * on the way back), and the second sending gets the first answer instead of a second record.
 * Written in the command's own transaction, so a command that failed leaves no key.
 */
export const commandKeys = pgTable(
  'command_keys',
  {
    key: text('key').primaryKey(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    method: text('method').notNull(),
    path: text('path').notNull(),
    /** The answer's body; null when it was too large to keep (a repeat then answers 409). */
    response: jsonb('response'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('command_keys_created_idx').on(t.createdAt)],
);
