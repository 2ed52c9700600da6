import { getTableName, is } from 'drizzle-orm';
import { PgTable, type PgColumn } from 'drizzle-orm/pg-core';
import * as schema from '../../database/schema/index.js';
import { boltDownHoles, safetyAnswers } from '../../database/schema/index.js';
import { isSignedRecordType, RECORD_TYPES, SIGNED_RECORD_TYPES, type SignedRecordType } from '../../records/kinds.js';

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

/** Child rows signed with their record, and columns left out of the signature: the exceptions. */
const CHILDREN: Partial<Record<SignedRecordKind, ChildRows>> = {
  'bolt-down': {
    name: 'holes',
    table: boltDownHoles,
    parent: boltDownHoles.boltDownId,
    orderBy: [boltDownHoles.holeIndex, boltDownHoles.id],
  },
  'safety-walk': {
    name: 'answers',
    table: safetyAnswers,
    parent: safetyAnswers.walkId,
    orderBy: [safetyAnswers.itemKey, safetyAnswers.id],
  },
};
const UNSIGNED: Partial<Record<SignedRecordKind, readonly string[]>> = {
  machine: ['state', 'version', 'lastActivityAt', 'updatedAt'],
};

const TABLES = new Map(
  (Object.values(schema) as unknown[]).filter((t): t is TableWithId => is(t, PgTable)).map((t) => [getTableName(t), t]),
);

function tableOf(kind: SignedRecordKind): TableWithId {
  const table = TABLES.get(RECORD_TYPES[kind].table);
  if (!table)
    throw new Error(
      `records/kinds.ts names table ${RECORD_TYPES[kind].table} for ${kind}, which the schema does not have`,
    );
  return table;
}

/** Where each kind of record lives: the table its entry in records/kinds.ts names, with the exceptions above. */
export const SIGNED_RECORDS = Object.fromEntries(
  SIGNED_RECORD_KINDS.map((kind): [SignedRecordKind, SignedRecordSpec] => [
    kind,
    { table: tableOf(kind), children: CHILDREN[kind], unsigned: UNSIGNED[kind] },
  ]),
) as Record<SignedRecordKind, SignedRecordSpec>;
