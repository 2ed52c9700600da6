import { TransactionContext, isRetryable } from './transaction-context.js';
import type { Database } from './database.tokens.js';

/**
 * A stand-in for the Drizzle database: `transaction` runs the callback with a fake handle and
 * can be told to fail the first attempts with a PostgreSQL error code, as the server would.
 */
function fakeDatabase(failures: string[]) {
  const calls = { transactions: 0, statements: [] as string[] };
  const db = {
    async transaction<T>(fn: (tx: unknown) => Promise<T>): Promise<T> {
      calls.transactions++;
      const tx = { execute: async () => calls.statements.push('set actor') };
      const result = await fn(tx);
      const code = failures.shift();
      if (code) {
        // node-postgres errors carry the SQLSTATE in `code`; Drizzle wraps them with the original as `cause`.
        throw Object.assign(new Error('Failed query'), {
          cause: Object.assign(new Error('deadlock detected'), { code }),
        });
      }
      return result;
    },
  };
  return { db: db as unknown as Database, calls };
}

describe('TransactionContext.run', () => {
  it('reruns the whole command after a deadlock (40P01) and answers with the second run', async () => {
    const { db, calls } = fakeDatabase(['40P01']);
    const context = new TransactionContext(db);
    let runs = 0;
    const result = await context.run(async () => ++runs, { actor: { id: null, name: 'Ann', workshopId: null } });
    expect(result).toBe(2);
    expect(calls.transactions).toBe(2);
    expect(calls.statements).toEqual(['set actor', 'set actor']);
  });

  it('reruns after a serialization failure (40001)', async () => {
    const { db, calls } = fakeDatabase(['40001', '40001']);
    const result = await new TransactionContext(db).run(async () => 'saved');
    expect(result).toBe('saved');
    expect(calls.transactions).toBe(3);
  });

  it('gives up after four attempts and lets the last error through', async () => {
    const { db, calls } = fakeDatabase(['40P01', '40P01', '40P01', '40P01', '40P01']);
    await expect(new TransactionContext(db).run(async () => 'never')).rejects.toThrow('Failed query');
    expect(calls.transactions).toBe(4);
  });

  it('does not rerun other errors, nor commands that cannot be repeated (uploads)', async () => {
    const other = fakeDatabase(['23505']);
    await expect(new TransactionContext(other.db).run(async () => 1)).rejects.toThrow();
    expect(other.calls.transactions).toBe(1);
    const upload = fakeDatabase(['40P01']);
    await expect(new TransactionContext(upload.db).run(async () => 1, { retry: false })).rejects.toThrow();
    expect(upload.calls.transactions).toBe(1);
  });

  it('runs after-commit work once, for the attempt that committed', async () => {
    const { db } = fakeDatabase(['40P01']);
    const context = new TransactionContext(db);
    const sent: number[] = [];
    let runs = 0;
    await context.run(async () => {
      const attempt = ++runs;
      context.afterCommit(() => sent.push(attempt));
    });
    expect(sent).toEqual([2]);
  });

  it('knows the retryable codes whether or not they are wrapped', () => {
    expect(isRetryable({ code: '40P01' })).toBe(true);
    expect(isRetryable({ cause: { code: '40001' } })).toBe(true);
    expect(isRetryable({ code: '23505' })).toBe(false);
    expect(isRetryable(undefined)).toBe(false);
  });
});
