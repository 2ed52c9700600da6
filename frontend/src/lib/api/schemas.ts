import type { components } from './schema';

/**
 * The server's shapes by name, as its description gives them (backend/openapi.json → schema.d.ts):
 * `Schemas['CreateSweepDto']`. Features alias these instead of writing the shapes again.
 */
export type Schemas = components['schemas'];
