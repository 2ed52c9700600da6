import type { NodePgDatabase } from 'drizzle-orm/node-postgres';
import type * as schema from './schema/index.js';

/** The handle repositories inject: the current command's transaction, or the pool outside one. */
export const DRIZZLE = Symbol('DRIZZLE');
/** The pool-backed handle itself; only the transaction context uses it. */
export const ROOT_DRIZZLE = Symbol('ROOT_DRIZZLE');
export const PG_POOL = Symbol('PG_POOL');
export type Database = NodePgDatabase<typeof schema>;
