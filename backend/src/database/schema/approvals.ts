import { index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { id, oneOf } from './columns.js';
import { workshops } from './workshops.js';
import { machines } from './machines.js';
import { users } from './users.js';
import type { ApprovalSnapshot } from '../../approvals/snapshot.js';
import type { TargetValue } from './target-sets.js';
import { SIGNED_RECORD_TYPES, type SignedRecordType } from '../../records/kinds.js';

/**
 * An owner's written reason for letting one check pass. It belongs to the record the check had
 * when it was waived: a new record of that check needs a new waiver.
 */
export const waivers = pgTable(
  'waivers',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    checkKey: text('check_key').notNull(),
    /** The check's record when waived; null for a check never started. */
    recordType: text('record_type').$type<SignedRecordType>(),
    recordId: uuid('record_id'),
    reason: text('reason').notNull(),
    waivedById: uuid('waived_by_id')
      .notNull()
      .references(() => users.id),
    waivedByName: text('waived_by_name').notNull(),
    waivedAt: timestamp('waived_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('waivers_machine_idx').on(t.machineId, t.checkKey),
    oneOf('waivers_record_type_check', t.recordType, SIGNED_RECORD_TYPES),
  ],
);

export const APPROVAL_REQUEST_STATUSES = ['open', 'approved', 'closed'] as const;

/** A technician's (or owner's) request that the machine be approved; it moves it to awaiting-approval. */
export const approvalRequests = pgTable(
  'approval_requests',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    requestedById: uuid('requested_by_id')
      .notNull()
      .references(() => users.id),
    requestedByName: text('requested_by_name').notNull(),
    requestedAt: timestamp('requested_at', { withTimezone: true }).notNull().defaultNow(),
    /** open until approved, or closed when a check leaves the target before that. */
    status: text('status', { enum: APPROVAL_REQUEST_STATUSES }).notNull().default('open'),
  },
  (t) => [
    index('approval_requests_machine_idx').on(t.machineId),
    // One open request per machine, however many clicks or server instances ask at once.
    uniqueIndex('approval_requests_one_open')
      .on(t.machineId)
      .where(sql`${t.status} = 'open'`),
    oneOf('approval_requests_status_check', t.status, APPROVAL_REQUEST_STATUSES),
  ],
);

/** The owner's signed approval: who, when, the statement, and the exact results it was based on. */
export const approvals = pgTable(
  'approvals',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    requestId: uuid('request_id').references(() => approvalRequests.id),
    approvedById: uuid('approved_by_id')
      .notNull()
      .references(() => users.id),
    approvedByName: text('approved_by_name').notNull(),
    approvedAt: timestamp('approved_at', { withTimezone: true }).notNull(),
    statement: text('statement').notNull(),
    snapshot: jsonb('snapshot').$type<ApprovalSnapshot>().notNull(),
    /** SHA-256 (hex) of the snapshot's canonical JSON. */
    recordHash: text('record_hash').notNull(),
    recheckIntervalDays: integer('recheck_interval_days').notNull(),
    recheckDueAt: timestamp('recheck_due_at', { withTimezone: true }).notNull(),
    /** Set once the re-check-due e-mail went out, so it goes once per due date. */
    recheckNotifiedAt: timestamp('recheck_notified_at', { withTimezone: true }),
    /** The target values the machine was judged against, as they were when signed. */
    targetValues: jsonb('target_values').$type<Record<string, TargetValue>>(),
    /** Ed25519 signature (base64) over the canonical signed record; null for approvals signed before signatures. */
    signature: text('signature'),
    /** SHA-256 fingerprint of the public key that made the signature. */
    signingKeyId: text('signing_key_id'),
    /** The canonical record as signed: kept only to name what differs, never to decide validity. */
    signedContent: text('signed_content'),
    /** Unguessable token of the public verification address printed on the certificate. */
    verificationToken: text('verification_token'),
    /** Set when the owner reopens the machine: the approval no longer stands. */
    endedAt: timestamp('ended_at', { withTimezone: true }),
    endedById: uuid('ended_by_id').references(() => users.id),
    endedByName: text('ended_by_name'),
    endReason: text('end_reason'),
  },
  (t) => [
    index('approvals_machine_idx').on(t.machineId, t.approvedAt),
    index('approvals_recheck_idx').on(t.recheckDueAt),
    // One standing approval per machine: a second signature for the same request is refused by the database.
    uniqueIndex('approvals_one_standing')
      .on(t.machineId)
      .where(sql`${t.endedAt} is null`),
    uniqueIndex('approvals_verification_token').on(t.verificationToken),
  ],
);
