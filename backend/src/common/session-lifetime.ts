import type { FastifyInstance } from 'fastify';

/**
 * The store expires a session after its idle lifetime; this ends it a fixed time after sign-in
 * too, however active it stays. The sign-in handler writes `createdAt`; a session without it
 * (made before this rule) is treated as made now.
 */
export function absoluteSessionLifetime(
  fastify: FastifyInstance,
  maxAgeMs: number,
  now: () => number = Date.now,
): void {
  fastify.addHook('preHandler', async (req) => {
    const session = (
      req as { session?: { get(k: string): unknown; set(k: string, v: unknown): void; destroy(): Promise<void> } }
    ).session;
    if (!session || session.get('userId') === undefined) return;
    const createdAt = session.get('createdAt');
    if (typeof createdAt !== 'number') {
      session.set('createdAt', now());
      return;
    }
    if (now() - createdAt > maxAgeMs) await session.destroy();
  });
}
