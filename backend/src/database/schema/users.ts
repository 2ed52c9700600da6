import { boolean, index, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { id, oneOf, timestamps } from './columns.js';
import { workshops } from './workshops.js';

export const ROLES = ['admin', 'owner', 'technician', 'builder', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const users = pgTable(
  'users',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    email: text('email').notNull(),
    name: text('name').notNull(),
    role: text('role', { enum: ROLES }).notNull(),
    passwordHash: text('password_hash').notNull(),
    active: boolean('active').notNull().default(true),
    /** Invited but has not chosen a password yet: only then may an admin send a sign-in link. */
    passwordPending: boolean('password_pending').notNull().default(false),
    /** Sessions signed in before this moment are refused: set when the password changes or the person is deactivated. */
    sessionsValidFrom: timestamp('sessions_valid_from', { withTimezone: true }).notNull().defaultNow(),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('users_email_unique').on(sql`lower(${t.email})`),
    index('users_workshop_idx').on(t.workshopId),
    oneOf('users_role_check', t.role, ROLES),
  ],
);
