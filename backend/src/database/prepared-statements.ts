import type pg from 'pg';

/**
 * How many statements one connection keeps prepared. The server's own statements are far fewer;
 * the limit only stops text that varies (a list of ids written into the SQL) from filling a
 * connection's memory: past it, new texts run unprepared as before.
 */
export const MAX_PREPARED_PER_CONNECTION = 400;

// One name per statement text for the whole process, so a name never means two texts; bounded
// like each connection's own list, so text that varies cannot grow it without end.
const MAX_NAMES = 4_000;
const names = new Map<string, string>();
const nameOf = (text: string): string | undefined => {
  let name = names.get(text);
  if (!name && names.size < MAX_NAMES) names.set(text, (name = `rw${names.size + 1}`));
  return name;
};

type QueryArgs = Parameters<pg.Client['query']>;

/**
 * Makes every statement with parameters a prepared one on this connection: PostgreSQL then parses
 * and plans it once per connection instead of on every request, which was the larger part of
 * its work for the short statements of a write (planning 0.2–0.3 ms against 0.05–0.3 ms of
 * execution). Statements without parameters keep the simple protocol, where one text may hold
 * several statements (`begin; select set_config(...)`). node-postgres remembers per connection
 * which names it has prepared; PostgreSQL plans again by itself when a table changes under a plan.
 */
export function prepareRepeatedStatements(client: pg.Client, most = MAX_PREPARED_PER_CONNECTION): void {
  // Looked up on each call, not bound once, so a wrapper set on the class later still runs.
  const query = (...args: unknown[]) =>
    (Object.getPrototypeOf(client) as { query: (...a: unknown[]) => unknown }).query.apply(client, args);
  const prepared = new Set<string>();
  const named = (text: string): string | undefined => {
    const name = nameOf(text);
    if (!name || prepared.has(name)) return name;
    if (prepared.size >= most) return undefined;
    prepared.add(name);
    return name;
  };
  client.query = ((...args: QueryArgs) => {
    const [config, values] = args as unknown[];
    if (typeof config === 'string') {
      const name = Array.isArray(values) && values.length ? named(config) : undefined;
      if (name) args[0] = { text: config, name } as never;
    } else if (isPlainQueryConfig(config)) {
      const params = Array.isArray(values) ? values : config.values;
      const name = params?.length ? named(config.text) : undefined;
      if (name) args[0] = { ...config, name } as never;
    }
    return query(...args);
  }) as pg.Client['query'];
}

function isPlainQueryConfig(value: unknown): value is pg.QueryConfig {
  if (!value || typeof value !== 'object') return false;
  const config = value as { text?: unknown; name?: unknown; submit?: unknown };
  // A submittable (a cursor, a stream) manages its own protocol; a named query is left as named.
  return typeof config.text === 'string' && !config.name && typeof config.submit !== 'function';
}
