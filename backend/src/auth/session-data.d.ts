import '@fastify/session';

declare module 'fastify' {
  interface Session {
    userId?: string;
    /** When the person signed in (ms since 1970): sessions older than their `sessions_valid_from` are refused. */
    createdAt?: number;
  }
}
