import type { Role } from '../database/schema/users.js';

export interface PersonRow {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  passwordPending: boolean;
  createdAt: Date;
}

export interface PersonResponse {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  /** Invited and not yet signed up: the admin may send the invitation again. */
  invitationPending: boolean;
  createdAt: string;
}

export const toPersonResponse = (row: PersonRow): PersonResponse => ({
  id: row.id,
  email: row.email,
  name: row.name,
  role: row.role,
  active: row.active,
  invitationPending: row.passwordPending,
  createdAt: row.createdAt.toISOString(),
});
