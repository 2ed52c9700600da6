import type pg from 'pg';

/**
 * A transaction's client that sends its next query only once the last one has answered. Code in
 * a command may start several reads at once (`Promise.all`); node-postgres 8 queues them itself
 * but calls that deprecated, and version 9 refuses a query while another is running. Here they
 * wait their turn in the order they were started, which is the order node-postgres used.
 */
export function oneQueryAtATime(client: pg.PoolClient): pg.PoolClient {
  let last: Promise<unknown> = Promise.resolve();
  const query = ((...args: unknown[]) => {
    const run = last.then(() => (client.query as (...a: unknown[]) => Promise<unknown>)(...args));
    last = run.catch(() => undefined);
    return run;
  }) as pg.PoolClient['query'];
  return new Proxy(client, {
    get(target, prop, receiver) {
      if (prop === 'query') return query;
      const value = Reflect.get(target, prop, receiver);
      return typeof value === 'function' ? value.bind(target) : value;
    },
  });
}
