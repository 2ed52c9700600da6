import { backlashChecks, bedGrids, diagonalChecks, testCuts } from '../database/schema/index.js';
import { checkTable } from './check-records.js';
import type { SignedRecordType } from './kinds.js';

/**
 * The tables of check records kept under a parent, by record type: a new check of this shape is
 * one line here instead of a repository of its own (`CheckRecordsRepository.of(type)`).
 */
export const CHECK_RECORD_TABLES = {
  'backlash-check': checkTable({ table: backlashChecks, parent: 'axisId' }),
  'diagonal-check': checkTable({ table: diagonalChecks, parent: 'machineId', time: 'recordedAt' }),
  'bed-grid': checkTable({ table: bedGrids, parent: 'machineId', time: 'recordedAt' }),
  'test-cut': checkTable({ table: testCuts, parent: 'machineId', time: 'recordedAt' }),
} satisfies { [K in SignedRecordType]?: unknown };

export type CheckRecordType = keyof typeof CHECK_RECORD_TABLES;
export type CheckRecordTable<K extends CheckRecordType> = (typeof CHECK_RECORD_TABLES)[K]['table'];
/** A row of a check's table as the query builder returns it. */
export type CheckRecordRow<K extends CheckRecordType> = CheckRecordTable<K>['$inferSelect'];
