import { pgTable, text } from 'drizzle-orm/pg-core';
import { id, timestamps } from './columns.js';

/** The tenant: every other record hangs off one workshop. */
export const workshops = pgTable('workshops', {
  id: id(),
  name: text('name').notNull(),
  ...timestamps,
});
