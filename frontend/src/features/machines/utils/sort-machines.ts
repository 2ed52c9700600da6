import { KIND_LABELS, STATE_LABELS, type MachineListItem } from '../types';

export interface MachineSort {
  by: 'name' | 'kind' | 'state' | 'checks' | 'lastActivityAt';
  direction: 'asc' | 'desc';
}

const text = (a: string, b: string) => a.localeCompare(b, undefined, { sensitivity: 'base', numeric: true });

const COMPARE: Record<MachineSort['by'], (a: MachineListItem, b: MachineListItem) => number> = {
  name: (a, b) => text(a.name, b.name),
  kind: (a, b) => text(KIND_LABELS[a.kind], KIND_LABELS[b.kind]),
  state: (a, b) => text(STATE_LABELS[a.state], STATE_LABELS[b.state]),
  // Share of checks within target, so a machine with 3 of 3 ranks above one with 3 of 9.
  checks: (a, b) => a.checks.within / Math.max(a.checks.total, 1) - b.checks.within / Math.max(b.checks.total, 1),
  lastActivityAt: (a, b) => Date.parse(a.lastActivityAt) - Date.parse(b.lastActivityAt),
};

/** A sorted copy; ties keep the name order so the list does not shuffle between renders. */
export function sortMachines(machines: MachineListItem[], sort: MachineSort): MachineListItem[] {
  const sign = sort.direction === 'asc' ? 1 : -1;
  return [...machines].sort((a, b) => sign * COMPARE[sort.by](a, b) || text(a.name, b.name));
}
