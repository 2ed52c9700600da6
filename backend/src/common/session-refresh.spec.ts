import type { FastifyInstance } from 'fastify';
import { refreshSessionsPeriodically } from './session-refresh.js';

const DAY = 24 * 3600 * 1000;

/** A session as @fastify/session hands it to hooks: values, and an expiry that touch() pushes on. */
function fakeSession(values: Record<string, unknown>) {
  let touched = 0;
  return {
    values,
    get: (k: string) => values[k],
    set: (k: string, v: unknown) => void (values[k] = v),
    touch: () => void touched++,
    touched: () => touched,
  };
}

function hookOf(now: number) {
  let hook: ((req: unknown) => Promise<void>) | undefined;
  const fastify = { addHook: (_name: string, fn: typeof hook) => (hook = fn) } as unknown as FastifyInstance;
  refreshSessionsPeriodically(fastify, DAY, () => now);
  return hook!;
}

describe('refreshSessionsPeriodically', () => {
  const t0 = Date.UTC(2026, 0, 1);

  it('leaves a session refreshed less than a day ago untouched (nothing to store)', async () => {
    const session = fakeSession({ userId: 'u', createdAt: t0, refreshedAt: t0 + 2 * DAY });
    await hookOf(t0 + 3 * DAY - 1)({ session });
    expect(session.touched()).toBe(0);
    expect(session.values.refreshedAt).toBe(t0 + 2 * DAY);
  });

  it('refreshes a session whose last refresh is over a day old: expiry pushed, change stored', async () => {
    const session = fakeSession({ userId: 'u', createdAt: t0, refreshedAt: t0 });
    await hookOf(t0 + DAY + 1)({ session });
    expect(session.touched()).toBe(1);
    expect(session.values.refreshedAt).toBe(t0 + DAY + 1);
  });

  it('counts from sign-in when the session was never refreshed', async () => {
    const fresh = fakeSession({ userId: 'u', createdAt: t0 });
    await hookOf(t0 + 1000)({ session: fresh });
    expect(fresh.touched()).toBe(0);
    const old = fakeSession({ userId: 'u', createdAt: t0 });
    await hookOf(t0 + 2 * DAY)({ session: old });
    expect(old.touched()).toBe(1);
  });

  it('does nothing for a request without a signed-in session', async () => {
    const anonymous = fakeSession({});
    await hookOf(t0)({ session: anonymous });
    await hookOf(t0)({});
    expect(anonymous.touched()).toBe(0);
    expect(anonymous.values).toEqual({});
  });
});
