import type { components, paths } from './schema';

/**
 * The server's shapes by name, as its description gives them (backend/openapi.json → schema.d.ts):
 * `Schemas['CreateSweepDto']`. Features alias these instead of writing the shapes again.
 */
export type Schemas = components['schemas'];

type JsonOf<R> = R extends { content: { 'application/json': infer T } } ? T : never;

/**
 * A route's JSON answer, for answers the description gives inline rather than by name:
 * `AnswerOf<'/api/calc/drive', 'post'>`.
 */
export type AnswerOf<
  P extends keyof paths,
  M extends 'get' | 'post' | 'put' | 'patch' | 'delete',
> = paths[P][M] extends { responses: infer R } ? JsonOf<R[keyof R & (200 | 201 | 202)]> : never;
