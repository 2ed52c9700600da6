import { boolean, index, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { id, oneOf } from './columns.js';
import { workshops } from './workshops.js';
import { machines } from './machines.js';
import { users } from './users.js';

export const SAFETY_SECTIONS = ['stopping', 'electrical', 'cutting', 'people'] as const;
export type SafetySection = (typeof SAFETY_SECTIONS)[number];

export const SAFETY_ANSWERS = ['yes', 'no', 'na'] as const;
export type SafetyAnswer = (typeof SAFETY_ANSWERS)[number];

/** A workshop's own safety-walk item, asked on every machine's walk beside the built-in ones. */
export const safetyItems = pgTable(
  'safety_items',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    section: text('section', { enum: SAFETY_SECTIONS }).notNull(),
    text: text('text').notNull(),
    active: boolean('active').notNull().default(true),
    createdById: uuid('created_by_id').references(() => users.id),
    createdByName: text('created_by_name').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('safety_items_workshop_idx').on(t.workshopId),
    oneOf('safety_items_section_check', t.section, SAFETY_SECTIONS),
  ],
);

/** One round of the safety walk of a machine; the latest is the current walk. */
export const safetyWalks = pgTable(
  'safety_walks',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    startedAt: timestamp('started_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('safety_walks_machine_idx').on(t.workshopId, t.machineId, t.startedAt)],
);

/** The answer to one item of a walk; itemKey is a built-in item's key or a workshop item's id. */
export const safetyAnswers = pgTable(
  'safety_answers',
  {
    id: id(),
    walkId: uuid('walk_id')
      .notNull()
      .references(() => safetyWalks.id),
    itemKey: text('item_key').notNull(),
    answer: text('answer', { enum: SAFETY_ANSWERS }).notNull(),
    note: text('note').notNull().default(''),
    answeredById: uuid('answered_by_id').references(() => users.id),
    answeredByName: text('answered_by_name').notNull(),
    answeredAt: timestamp('answered_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('safety_answers_walk_item_unique').on(t.walkId, t.itemKey),
    oneOf('safety_answers_answer_check', t.answer, SAFETY_ANSWERS),
  ],
);
