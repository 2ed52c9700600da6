import type { Schemas } from '../api/schemas';

/** The signed-in person, as GET /api/auth/me answers. */
export type User = Schemas['UserResponse'];
export type Role = User['role'];
