import type { machines } from '../database/schema/index.js';
import type { ReadinessCheck } from '../records/readiness.js';

export type MachineRow = typeof machines.$inferSelect;

export interface MachineResponse {
  id: string;
  name: string;
  kind: MachineRow['kind'];
  state: MachineRow['state'];
  workArea: { x: number; y: number };
  notes: string;
  targetSet: { id: string; name: string };
  lastActivityAt: string;
  createdAt: string;
  updatedAt: string;
}

export interface MachineListItem extends MachineResponse {
  checks: { within: number; total: number; outside: number };
}

export function toMachineResponse(row: MachineRow, targetSetName: string): MachineResponse {
  return {
    id: row.id,
    name: row.name,
    kind: row.kind,
    state: row.state,
    workArea: { x: row.workAreaXMm, y: row.workAreaYMm },
    notes: row.notes,
    targetSet: { id: row.targetSetId, name: targetSetName },
    lastActivityAt: row.lastActivityAt.toISOString(),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function countChecks(checks: ReadinessCheck[]) {
  return {
    total: checks.length,
    within: checks.filter((c) => c.status === 'within-target').length,
    outside: checks.filter((c) => c.status === 'outside-target').length,
  };
}
