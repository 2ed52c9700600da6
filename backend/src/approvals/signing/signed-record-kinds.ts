import type { PgColumn, PgTable } from 'drizzle-orm/pg-core';
import {
  axes,
  backlashChecks,
  bedGrids,
  boltDownHoles,
  boltDowns,
  diagonalChecks,
  machines,
  positioningRuns,
  rails,
  railSweeps,
  safetyAnswers,
  safetyWalks,
  testCuts,
  travelTrials,
  waivers,
} from '../../database/schema/index.js';
import { isSignedRecordType, SIGNED_RECORD_TYPES, type SignedRecordType } from '../../records/kinds.js';

/** Every kind of record an approval can stand on (the record types written to record_locks): `signed` in records/kinds.ts. */
export const SIGNED_RECORD_KINDS: readonly SignedRecordType[] = SIGNED_RECORD_TYPES;
export type SignedRecordKind = SignedRecordType;

export const isSignedRecordKind = isSignedRecordType;

type TableWithId = PgTable & { id: PgColumn };

/** Rows that belong to a record and are signed with it (a bolt-down's holes, a walk's answers). */
export interface ChildRows {
  /** Member name in the signed content. */
  name: string;
  table: PgTable;
  parent: PgColumn;
  /** Sort order of the child rows, so the same rows always sign the same. */
  orderBy: PgColumn[];
}

export interface SignedRecordSpec {
  table: TableWithId;
  children?: ChildRows;
  /**
   * Columns that legitimately change while the approval stands and so are not signed: only the
   * machine's own state and bookkeeping (its specification stays signed).
   */
  unsigned?: readonly string[];
}

/** Where each kind of record lives. A kind marked `signed` in records/kinds.ts must be added here (the type insists). */
export const SIGNED_RECORDS: Record<SignedRecordKind, SignedRecordSpec> = {
  machine: { table: machines, unsigned: ['state', 'version', 'lastActivityAt', 'updatedAt'] },
  rail: { table: rails },
  axis: { table: axes },
  waiver: { table: waivers },
  'rail-sweep': { table: railSweeps },
  'bolt-down': { table: boltDowns, children: { name: 'holes', table: boltDownHoles, parent: boltDownHoles.boltDownId, orderBy: [boltDownHoles.holeIndex, boltDownHoles.id] } },
  'travel-trial': { table: travelTrials },
  'positioning-run': { table: positioningRuns },
  'diagonal-check': { table: diagonalChecks },
  'bed-grid': { table: bedGrids },
  'test-cut': { table: testCuts },
  'safety-walk': { table: safetyWalks, children: { name: 'answers', table: safetyAnswers, parent: safetyAnswers.walkId, orderBy: [safetyAnswers.itemKey, safetyAnswers.id] } },
  'backlash-check': { table: backlashChecks },
};
