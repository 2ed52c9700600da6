import { bigint, index, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { id, oneOf } from './columns.js';
import { machines } from './machines.js';
import { approvals } from './approvals.js';
import { workshops } from './workshops.js';
import { users } from './users.js';
import { RECORD_TYPE_NAMES, SIGNED_RECORD_TYPES, type RecordType, type SignedRecordType } from '../../records/kinds.js';

/** Who changed what, when: every create, update and delete of every record of a machine. */
export const auditEntries = pgTable(
  'audit_entries',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id').references(() => machines.id),
    recordType: text('record_type').$type<RecordType>().notNull(),
    recordId: uuid('record_id'),
    action: text('action').notNull(),
    summary: text('summary').notNull().default(''),
    changes: jsonb('changes').$type<Record<string, unknown>>(),
    actorId: uuid('actor_id').references(() => users.id),
    actorName: text('actor_name').notNull(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    /** The transaction that wrote it: joins the summary to the row changes it made. */
    txid: bigint('txid', { mode: 'number' })
      .notNull()
      .default(sql`txid_current()`),
  },
  (t) => [
    index('audit_machine_idx').on(t.machineId, t.at),
    index('audit_workshop_idx').on(t.workshopId, t.at),
    index('audit_txid_idx').on(t.txid),
    oneOf('audit_entries_record_type_check', t.recordType, RECORD_TYPE_NAMES),
  ],
);

/**
 * Every insert, update and delete of every record, with its values before and after, written by
 * database triggers in the same transaction (so nothing escapes it) and never changed afterwards.
 * Secrets (password hashes, link tokens) are shown only as "changed".
 */
export const changeLog = pgTable(
  'change_log',
  {
    id: id(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    txid: bigint('txid', { mode: 'number' })
      .notNull()
      .default(sql`txid_current()`),
    workshopId: uuid('workshop_id'),
    machineId: uuid('machine_id'),
    tableName: text('table_name').notNull(),
    recordId: uuid('record_id'),
    operation: text('operation', { enum: ['insert', 'update', 'delete'] }).notNull(),
    oldValues: jsonb('old_values').$type<Record<string, unknown>>(),
    newValues: jsonb('new_values').$type<Record<string, unknown>>(),
    actorId: uuid('actor_id'),
    actorName: text('actor_name'),
  },
  (t) => [
    index('change_log_machine_idx').on(t.machineId, t.at),
    index('change_log_txid_idx').on(t.txid),
    index('change_log_workshop_idx').on(t.workshopId, t.at),
    oneOf('change_log_operation_check', t.operation, ['insert', 'update', 'delete']),
  ],
);

/** A record that an approval was based on; it can no longer be edited or deleted. */
export const recordLocks = pgTable(
  'record_locks',
  {
    id: id(),
    recordType: text('record_type').$type<SignedRecordType>().notNull(),
    recordId: uuid('record_id').notNull(),
    approvalId: uuid('approval_id')
      .notNull()
      .references(() => approvals.id),
    lockedAt: timestamp('locked_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('record_locks_unique').on(t.recordType, t.recordId, t.approvalId),
    index('record_locks_record_idx').on(t.recordType, t.recordId),
    oneOf('record_locks_record_type_check', t.recordType, SIGNED_RECORD_TYPES),
  ],
);
