import { timestamp, uuid } from 'drizzle-orm/pg-core';

/** Primary key shared by every table; uuids let the browser make ids for retried writes. */
export const id = () => uuid('id').primaryKey().defaultRandom();

export const timestamps = {
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
};
