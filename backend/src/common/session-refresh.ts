import type { FastifyInstance } from 'fastify';

type RefreshableSession = { get(k: string): unknown; set(k: string, v: unknown): void; touch(): void };

/**
 * Sessions are not rewritten on every request (rolling off): a signed-in session is refreshed —
 * its idle expiry pushed forward, stored and its cookie sent again — only once its last refresh is
 * older than `everyMs`. A session idle for its whole lifetime since that refresh still ends.
 * The refresh moment starts as the sign-in moment (`createdAt`, set at sign-in).
 */
export function refreshSessionsPeriodically(
  fastify: FastifyInstance,
  everyMs: number,
  now: () => number = Date.now,
): void {
  fastify.addHook('preHandler', async (req) => {
    const session = (req as { session?: RefreshableSession }).session;
    if (!session || session.get('userId') === undefined) return;
    const last = session.get('refreshedAt') ?? session.get('createdAt');
    if (typeof last === 'number' && now() - last < everyMs) return;
    session.touch();
    session.set('refreshedAt', now());
  });
}
