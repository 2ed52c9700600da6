import type { Role } from '../database/schema/users.js';

/** Who records and applies drive calibration; builders and viewers read it. */
export const CALIBRATORS: Role[] = ['admin', 'owner', 'technician'];
