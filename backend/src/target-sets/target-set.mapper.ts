import type { TargetValue } from '../database/schema/target-sets.js';
import { TARGET_KEYS, TARGET_LABELS, type TargetKey } from './target-keys.js';

export interface TargetSetRow {
  id: string;
  name: string;
  description: string;
  targets: Record<string, TargetValue>;
  updatedAt: Date;
}

export interface TargetSetResponse {
  id: string;
  name: string;
  description: string;
  targets: Record<TargetKey, TargetValue & { label: string }>;
  updatedAt: string;
}

export function toTargetSetResponse(row: TargetSetRow): TargetSetResponse {
  const targets = {} as TargetSetResponse['targets'];
  for (const key of TARGET_KEYS) {
    const t = row.targets[key];
    if (t) targets[key] = { ...t, label: TARGET_LABELS[key] };
  }
  return { id: row.id, name: row.name, description: row.description, targets, updatedAt: row.updatedAt.toISOString() };
}
