import type { Role } from './user';

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  owner: 'Owner',
  technician: 'Technician',
  builder: 'Builder',
  viewer: 'Viewer',
};

/** Roles that record checks (everyone but viewers). */
export const canRecord = (role: Role | undefined) => !!role && role !== 'viewer';
export const canCalibrate = (role: Role | undefined) => role === 'technician' || role === 'owner' || role === 'admin';
export const canManageTargets = (role: Role | undefined) => role === 'owner' || role === 'admin';
