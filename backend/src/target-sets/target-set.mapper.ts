import type { TargetValue } from '../database/schema/target-sets.js';
import { APPROVED_STATES, type MachineState } from '../database/schema/machines.js';
import { TARGET_KEYS, TARGET_LABELS, type TargetKey } from './target-keys.js';

export interface TargetSetRow {
  id: string;
  name: string;
  description: string;
  targets: Record<string, TargetValue>;
  updatedAt: Date;
}

/** A machine judged against a set; `approved` when an approval of it stands on the set's values as they were signed. */
export interface TargetSetUser {
  id: string;
  name: string;
  state: MachineState;
  approved: boolean;
}

export interface TargetSetResponse {
  id: string;
  name: string;
  description: string;
  targets: Record<TargetKey, TargetValue & { label: string }>;
  updatedAt: string;
  /** Machines judged against this set: an edit changes their boards, never their standing approvals. */
  usedBy: TargetSetUser[];
}

export function toTargetSetUser(m: { id: string; name: string; state: MachineState }): TargetSetUser {
  return { id: m.id, name: m.name, state: m.state, approved: APPROVED_STATES.includes(m.state) };
}

export function toTargetSetResponse(row: TargetSetRow, usedBy: TargetSetUser[] = []): TargetSetResponse {
  const targets = {} as TargetSetResponse['targets'];
  for (const key of TARGET_KEYS) {
    const t = row.targets[key];
    if (t) targets[key] = { ...t, label: TARGET_LABELS[key] };
  }
  return {
    id: row.id,
    name: row.name,
    description: row.description,
    targets,
    updatedAt: row.updatedAt.toISOString(),
    usedBy,
  };
}
