import { bigint, boolean, index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { id, oneOf } from './columns.js';
import { workshops } from './workshops.js';
import { machines } from './machines.js';
import { users } from './users.js';
import {
  EVIDENCE_SUBJECT_TYPES,
  SIGNED_RECORD_TYPES,
  type EvidenceSubjectType,
  type SignedRecordType,
} from '../../records/kinds.js';

export const EVIDENCE_KINDS = ['photo', 'file'] as const;
export type EvidenceKind = (typeof EVIDENCE_KINDS)[number];

/**
 * A photo or file attached to a record of a machine (the machine itself, a rail, a check…).
 * The bytes live in the storage driver under storageKey; the row is written only after the
 * stored object passed every check.
 */
export const evidence = pgTable(
  'evidence',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    subjectType: text('subject_type').$type<EvidenceSubjectType>().notNull(),
    subjectId: uuid('subject_id').notNull(),
    /** The subject's name when the file was attached; shown if the subject is gone later. */
    subjectLabel: text('subject_label').notNull().default(''),
    /** What approvals lock: deleting is refused once this record is part of an approval. */
    recordType: text('record_type').$type<SignedRecordType>().notNull(),
    recordId: uuid('record_id').notNull(),
    kind: text('kind', { enum: EVIDENCE_KINDS }).notNull(),
    fileName: text('file_name').notNull(),
    caption: text('caption').notNull().default(''),
    contentType: text('content_type').notNull(),
    sizeBytes: bigint('size_bytes', { mode: 'number' }).notNull(),
    sha256: text('sha256').notNull(),
    storageKey: text('storage_key').notNull(),
    thumbnailKey: text('thumbnail_key'),
    widthPx: integer('width_px'),
    heightPx: integer('height_px'),
    uploadedById: uuid('uploaded_by_id').references(() => users.id),
    uploadedByName: text('uploaded_by_name').notNull(),
    /** Attached while an approval of the machine stood: shown apart, never part of what was signed. */
    addedAfterApproval: boolean('added_after_approval').notNull().default(false),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('evidence_subject_idx').on(t.workshopId, t.subjectType, t.subjectId),
    index('evidence_machine_idx').on(t.workshopId, t.machineId, t.createdAt),
    oneOf('evidence_subject_type_check', t.subjectType, EVIDENCE_SUBJECT_TYPES),
    oneOf('evidence_record_type_check', t.recordType, SIGNED_RECORD_TYPES),
    oneOf('evidence_kind_check', t.kind, EVIDENCE_KINDS),
  ],
);
