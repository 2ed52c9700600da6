import type { Schemas } from '../../lib/api/schemas';
import type { MachineState } from '../../lib/machine-state';

export type Machine = Schemas['MachineResponse'];
export type MachineListItem = Schemas['MachineListItem'];
export type MachineKind = Machine['kind'];

export const KIND_LABELS: Record<MachineKind, string> = { plasma: 'Plasma table', router: 'Router', other: 'Other' };

export const STATE_LABELS: Record<MachineState, string> = {
  'being-built': 'Being built',
  'awaiting-approval': 'Awaiting approval',
  'ready-to-cut': 'Ready to cut',
  'recheck-due': 'Re-check due',
  reopened: 'Reopened for changes',
  retired: 'Retired',
};
