import { is, SQL, sql, type Placeholder, type SQLWrapper } from 'drizzle-orm';
import * as drizzleUtils from 'drizzle-orm/utils';
import { PgInsertBase, PgSelectBase, type PgDialect } from 'drizzle-orm/pg-core';
import type { Database } from './database.tokens.js';

/**
 * Statements of the hottest writes whose SQL drizzle builds once. Building a statement walks every
 * chunk of it (a sweep's insert with its audit entry, the rail read with its joins) and took more
 * of the server's time per sweep than PostgreSQL took to run it; the text never changes, only the
 * values. Here the text, the order of its values and drizzle's row mapping are kept from the first
 * call, and each call sends only its values, through the current transaction's session.
 *
 * A statement is built with named slots (`sql.placeholder`) where its values go. A value is filled
 * in as drizzle fills a prepared query: a slot in a column's place (an insert's value, `eq(column,
 * slot)`) is encoded as that column (JSON for jsonb), a slot inside raw SQL is sent as it is.
 */

/** A statement's named slots: `slots.railId` is the placeholder for `values.railId`. */
export type Slots<V> = { readonly [K in keyof V & string]: Placeholder<K, V[K]> };

// Drizzle's own ordering of a select's fields, as its select builder uses it to map rows (not in its types).
const { orderSelectedFields } = drizzleUtils as unknown as { orderSelectedFields(fields: unknown): unknown[] };

const slots = new Proxy({} as Record<string, Placeholder>, {
  get: (_target, name) => (typeof name === 'string' ? sql.placeholder(name) : undefined),
});

interface Built {
  query: { sql: string; params: unknown[] };
  /** Drizzle's ordered fields for mapping rows; absent for raw SQL (rows come back as objects). */
  fields?: unknown[];
  joinsNotNullableMap?: Record<string, boolean>;
}

interface Session {
  prepareQuery(
    query: Built['query'],
    fields: unknown[] | undefined,
    name: string | undefined,
    isResponseInArrayMode: boolean,
  ): { execute(values: Record<string, unknown>): Promise<unknown>; joinsNotNullableMap?: Record<string, boolean> };
}

// Shapes per statement: a statement whose text depends on which values are present (an optional
// id) has a few; the bound only guards against a shape function that returns ever-new keys.
const MAX_SHAPES = 16;

function build(dialect: PgDialect, statement: SQLWrapper): Built {
  if (is(statement, PgSelectBase)) {
    const select = statement as unknown as { config: { fields: Record<string, unknown> } } & {
      joinsNotNullableMap: Record<string, boolean>;
    };
    return {
      query: dialect.sqlToQuery(statement.getSQL()),
      fields: orderSelectedFields(select.config.fields),
      joinsNotNullableMap: select.joinsNotNullableMap,
    };
  }
  if (is(statement, PgInsertBase)) {
    const insert = statement as unknown as { config: { returning?: unknown[] } };
    return { query: dialect.sqlToQuery(statement.getSQL()), fields: insert.config.returning };
  }
  if (is(statement, SQL)) return { query: dialect.sqlToQuery(statement) };
  throw new Error('A compiled statement is a select, an insert or raw SQL');
}

class Compiled<V extends Record<string, unknown>> {
  private readonly shapes = new Map<string, Built>();

  constructor(
    private readonly make: (slots: Slots<V>, values: V) => SQLWrapper,
    private readonly shapeOf: (values: V) => string,
  ) {}

  /** Runs on `db`: inside a command that is its transaction (see transactionalDatabase). */
  execute(db: Database, values: V): Promise<unknown> {
    const shape = this.shapeOf(values);
    let built = this.shapes.get(shape);
    if (!built) {
      built = build((db as unknown as { dialect: PgDialect }).dialect, this.make(slots as Slots<V>, values));
      if (this.shapes.size < MAX_SHAPES) this.shapes.set(shape, built);
    }
    const session = (db as unknown as { session: Session }).session;
    const prepared = session.prepareQuery(built.query, built.fields, undefined, !!built.fields);
    if (built.joinsNotNullableMap) prepared.joinsNotNullableMap = built.joinsNotNullableMap;
    return prepared.execute(values);
  }

  /** How many shapes were built so far (for tests). */
  get builtShapes(): number {
    return this.shapes.size;
  }
}

/**
 * A select or an insert (with `returning`) built once; a call answers the rows as drizzle maps
 * them, the same as awaiting the builder. `shapeOf` names the statement's shape when its text
 * depends on the values (which optional columns an insert carries); one shape by default.
 */
export function compiledQuery<V extends Record<string, unknown>, Q extends SQLWrapper & PromiseLike<unknown>>(
  make: (slots: Slots<V>, values: V) => Q,
  shapeOf: (values: V) => string = () => '',
) {
  const compiled = new Compiled(make, shapeOf);
  const run = (db: Database, values: V) => compiled.execute(db, values) as Promise<Awaited<Q>>;
  return Object.assign(run, { builtShapes: () => compiled.builtShapes });
}

/** Raw SQL built once; a call answers its rows as PostgreSQL's driver gives them (objects by column name). */
export function compiledSql<Row, V extends Record<string, unknown>>(
  make: (slots: Slots<V>, values: V) => SQL,
  shapeOf: (values: V) => string = () => '',
) {
  const compiled = new Compiled(make, shapeOf);
  const run = (db: Database, values: V) => compiled.execute(db, values) as Promise<{ rows: Row[] }>;
  return Object.assign(run, { builtShapes: () => compiled.builtShapes });
}

/** The shape of an insert whose values may leave columns out: the keys present, in order. */
export const keysShape = (values: Record<string, unknown>): string =>
  Object.keys(values)
    .filter((k) => values[k] !== undefined)
    .join(',');

/** An insert's values as slots: one per key present (a key left out keeps its column's default). */
export function slotsOf<V extends Record<string, unknown>>(s: Slots<V>, values: V): Slots<V> {
  const out: Record<string, unknown> = {};
  for (const key of Object.keys(values)) if (values[key] !== undefined) out[key] = s[key as keyof V & string];
  return out as Slots<V>;
}
