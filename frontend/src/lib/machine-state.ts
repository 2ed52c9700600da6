/** Where a machine stands; shown by the machines feature and judged by approvals. */
export type MachineState = 'being-built' | 'awaiting-approval' | 'ready-to-cut' | 'recheck-due' | 'reopened' | 'retired';
