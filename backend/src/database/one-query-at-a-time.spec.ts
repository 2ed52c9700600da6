import type pg from 'pg';
import { oneQueryAtATime } from './one-query-at-a-time.js';

/** A stand-in client whose queries answer after a delay, counting how many run at once. */
function slowClient() {
  const seen = { running: 0, most: 0, order: [] as string[] };
  const client = {
    async query(text: string) {
      seen.running++;
      seen.most = Math.max(seen.most, seen.running);
      await new Promise((resolve) => setTimeout(resolve, text === 'slow' ? 20 : 1));
      seen.running--;
      seen.order.push(text);
      if (text === 'bad') throw new Error('syntax error');
      return { rows: [text] };
    },
    release() {},
  };
  return { client: client as unknown as pg.PoolClient, seen };
}

describe('oneQueryAtATime', () => {
  it('sends queries started together one after another, in the order they were started', async () => {
    const { client, seen } = slowClient();
    const tx = oneQueryAtATime(client);
    const answers = await Promise.all(['slow', 'a', 'b'].map((q) => tx.query(q)));
    expect(answers.map((a) => (a as { rows: string[] }).rows[0])).toEqual(['slow', 'a', 'b']);
    expect(seen.order).toEqual(['slow', 'a', 'b']);
    expect(seen.most).toBe(1);
  });

  it('a failed query fails alone: the next still runs', async () => {
    const { client, seen } = slowClient();
    const tx = oneQueryAtATime(client);
    const [bad, next] = await Promise.allSettled([tx.query('bad'), tx.query('after')]);
    expect(bad.status).toBe('rejected');
    expect(next).toMatchObject({ status: 'fulfilled', value: { rows: ['after'] } });
    expect(seen.most).toBe(1);
  });

  it('passes everything else through to the client', () => {
    const { client } = slowClient();
    const released: unknown[] = [];
    (client as unknown as { release: (e?: unknown) => void }).release = (e) => released.push(e ?? 'released');
    oneQueryAtATime(client).release();
    expect(released).toEqual(['released']);
  });
});
