import type { LengthUnit } from '../../lib/units';

export type MachineKind = 'plasma' | 'router' | 'other';
export type MachineState = 'being-built' | 'awaiting-approval' | 'ready-to-cut' | 'recheck-due' | 'reopened' | 'retired';

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

/** One key factory for the feature; other features invalidate through it too. */
export const machineKeys = {
  all: ['machines'] as const,
  list: () => [...machineKeys.all, 'list'] as const,
  detail: (id: string) => [...machineKeys.all, 'detail', id] as const,
  history: (id: string) => [...machineKeys.all, 'history', id] as const,
};
