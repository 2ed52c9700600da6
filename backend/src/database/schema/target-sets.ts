import { index, jsonb, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps } from './columns.js';
import { workshops } from './workshops.js';

/** One tolerance of a target set, stored with its unit and where its default came from. */
/** The line straightness is judged from: minimum zone (ISO 1101's definition) or least squares. */
export const STRAIGHTNESS_REFERENCES = ['minimum-zone', 'least-squares'] as const;
export type StraightnessReference = (typeof STRAIGHTNESS_REFERENCES)[number];

/**
 * One tolerance of a target set, stored with its unit and where its default came from.
 * 'um/mm' is a target that scales with rail spacing: µm of height difference per mm of spacing
 * (K in S = a × K). `reference` is read on the rail straightness target only.
 */
export interface TargetValue {
  value: number;
  unit: 'mm' | 'um' | 'in' | 'thou' | 'mm/m' | '%' | 'days' | 'um/mm';
  source?: string;
  reference?: StraightnessReference;
}

export const targetSets = pgTable(
  'target_sets',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    name: text('name').notNull(),
    description: text('description').notNull().default(''),
    targets: jsonb('targets').$type<Record<string, TargetValue>>().notNull(),
    ...timestamps,
  },
  (t) => [index('target_sets_workshop_idx').on(t.workshopId)],
);
