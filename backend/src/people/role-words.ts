import type { Role } from '../database/schema/users.js';

export const ROLE_WORDS: Record<Role, string> = {
  admin: 'an admin (manages people)',
  owner: 'an owner (sets targets, waives, approves)',
  technician: 'a technician (calibrates drives, squares the gantry)',
  builder: 'a builder (mounts and aligns rails)',
  viewer: 'a viewer (reads records and certificates)',
};

/** The role's short name, for the history. */
export const ROLE_NAMES: Record<Role, string> = {
  admin: 'admin',
  owner: 'owner',
  technician: 'technician',
  builder: 'builder',
  viewer: 'viewer',
};
