import { index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/**
 * Sign-in attempts counted per key ("account:<e-mail>" or "address:<ip>"), shared by every
 * instance and kept across restarts. An attempt is counted before its password is checked, in one
 * atomic statement, and a successful sign-in takes its own count back.
 */
export const signInAttempts = pgTable(
  'sign_in_attempts',
  {
    key: text('key').primaryKey(),
    failures: integer('failures').notNull(),
    lastAttemptAt: timestamp('last_attempt_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('sign_in_attempts_last_idx').on(t.lastAttemptAt)],
);
