import { index, jsonb, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps } from './columns.js';
import { workshops } from './workshops.js';

/** One tolerance of a target set, stored with its unit and where its default came from. */
export interface TargetValue {
  value: number;
  unit: 'mm' | 'um' | 'in' | 'thou' | 'mm/m' | '%' | 'days';
  source?: string;
}

export const targetSets = pgTable(
  'target_sets',
  {
    id: id(),
    workshopId: uuid('workshop_id').notNull().references(() => workshops.id),
    name: text('name').notNull(),
    description: text('description').notNull().default(''),
    targets: jsonb('targets').$type<Record<string, TargetValue>>().notNull(),
    ...timestamps,
  },
  (t) => [index('target_sets_workshop_idx').on(t.workshopId)],
);
