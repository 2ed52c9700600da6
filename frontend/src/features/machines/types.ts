import type { LengthUnit } from '../../lib/units';
import type { MachineState } from '../../lib/machine-state';

export type MachineKind = 'plasma' | 'router' | 'other';

export interface Machine {
  id: string;
  name: string;
  kind: MachineKind;
  state: MachineState;
  /** In mm. */
  workArea: { x: number; y: number };
  /** The unit the work area was typed in and is shown in. */
  lengthUnit: LengthUnit;
  workAreaInLengthUnit: { x: number; y: number };
  notes: string;
  targetSet: { id: string; name: string };
  lastActivityAt: string;
  createdAt: string;
  updatedAt: string;
}

export interface MachineListItem extends Machine {
  checks: { within: number; total: number; outside: number };
}

export const KIND_LABELS: Record<MachineKind, string> = { plasma: 'Plasma table', router: 'Router', other: 'Other' };

export const STATE_LABELS: Record<MachineState, string> = {
  'being-built': 'Being built',
  'awaiting-approval': 'Awaiting approval',
  'ready-to-cut': 'Ready to cut',
  'recheck-due': 'Re-check due',
  reopened: 'Reopened for changes',
  retired: 'Retired',
};
