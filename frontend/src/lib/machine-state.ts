import type { Schemas } from './api/schemas';

/** Where a machine stands; shown by the machines feature and judged by approvals. */
export type MachineState = Schemas['MachineResponse']['state'];
