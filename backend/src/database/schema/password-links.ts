import { index, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { id, oneOf } from './columns.js';

export const PASSWORD_LINK_PURPOSES = ['invitation', 'reset'] as const;
import { users } from './users.js';

/**
 * A set-your-password link sent by e-mail. Only the SHA-256 of its token is kept, so a copy of
 * the database cannot be used to sign in; it works once and until it expires.
 */
export const passwordLinks = pgTable(
  'password_links',
  {
    id: id(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id),
    tokenHash: text('token_hash').notNull(),
    purpose: text('purpose', { enum: PASSWORD_LINK_PURPOSES }).notNull().default('invitation'),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('password_links_token_unique').on(t.tokenHash),
    index('password_links_user_idx').on(t.userId),
    oneOf('password_links_purpose_check', t.purpose, PASSWORD_LINK_PURPOSES),
  ],
);
