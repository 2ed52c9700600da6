import '@fastify/session';

declare module 'fastify' {
  interface Session {
    /** When the person signed in (ms since the epoch): the start of the absolute lifetime. */
    createdAt?: number;
  }
}
