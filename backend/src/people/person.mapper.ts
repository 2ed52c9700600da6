import type { Role } from '../database/schema/users.js';

export interface PersonRow {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  createdAt: Date;
}

export interface PersonResponse {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  createdAt: string;
}

export const toPersonResponse = (row: PersonRow): PersonResponse => ({
  id: row.id,
  email: row.email,
  name: row.name,
  role: row.role,
  active: row.active,
  createdAt: row.createdAt.toISOString(),
});
