import { CHECK_KIND_LABELS, type CheckKind } from '../../lib/record-kinds';
import type { MachineState } from '../../lib/machine-state';

export type CheckStatus = 'not-started' | 'within-target' | 'outside-target' | 'waived';
/** The check kinds and their words come from one list shared with the server's (lib/record-kinds.ts). */
export type { CheckKind };

export interface Target {
  value: number;
  unit: string;
  source?: string;
  label?: string;
}

export interface Waiver {
  id: string;
  reason: string;
  by: string;
  at: string;
}

/** A machine's screen as the server names it: its file on a tab, one of its rails or one of its axes. */
export type CheckPlace = { machineId: string; tab: 'readiness' | 'frame' | 'safety' | 'drives' | 'rails' } | { machineId: string; railId: string } | { machineId: string; axisId: string };

export interface BoardCheck {
  key: string;
  kind: CheckKind;
  subject: string;
  status: CheckStatus;
  measuredStatus: Exclude<CheckStatus, 'waived'>;
  target: Target | null;
  result: { value: number; unit: string; summary: string } | null;
  recordType: string | null;
  recordId: string | null;
  recordedAt: string | null;
  /** Where the check's record is shown; checkPath() makes the link. */
  place: CheckPlace;
  waiver: Waiver | null;
  /** What a person should know about the result; absent in approvals taken before warnings were kept. */
  warnings?: CheckWarning[];
}

/** A warning on a check's result: a stable code and a plain sentence with its numbers. */
export interface CheckWarning {
  code: string;
  message: string;
}

export interface BlockingCheck {
  key: string;
  kind: CheckKind;
  subject: string;
  status: CheckStatus;
}

export interface Approval {
  id: string;
  approvedAt: string;
  approvedBy: string;
  recordHash: string;
  statement: string;
  recheckDueAt: string;
  recheckIntervalDays: number;
  /** Token of the public verification page printed on the certificate; null for approvals signed before signatures were kept. */
  verificationToken: string | null;
  /** The approval stands and its re-check date has passed. */
  recheckDue: boolean;
  /** Set when the owner reopened the machine: the approval no longer stands. */
  reopened: { at: string; by: string | null; reason: string | null } | null;
}

export interface Readiness {
  machineId: string;
  state: MachineState;
  checks: BoardCheck[];
  blocking: BlockingCheck[];
  counts: { total: number; within: number; outside: number; waived: number; notStarted: number };
  approval: Approval | null;
  request: { id: string; requestedAt: string; requestedBy: string } | null;
  recheckDueAt: string | null;
  targetSet: { id: string; name: string; recheckIntervalDays: number };
  defaultStatement: string;
  /** The usual cautions for this kind of machine, read before signing. */
  cautions: { title: string; text: string }[];
}

export interface DriftSide {
  status: CheckStatus;
  result: BoardCheck['result'];
  recordId: string | null;
  recordedAt: string | null;
}

export interface DriftRow {
  key: string;
  kind: CheckKind;
  subject: string;
  target: Target | null;
  approved: DriftSide | null;
  latest: DriftSide | null;
  change: number | null;
  unit: string | null;
  rechecked: boolean;
  worse: boolean;
}

export interface Drift {
  approval: { id: string; approvedAt: string; approvedBy: string; recordHash: string } | null;
  rows: DriftRow[];
}

export const KIND_LABELS: Record<CheckKind, string> = CHECK_KIND_LABELS;

export const STATUS_LABELS: Record<CheckStatus, string> = {
  'not-started': 'Not started',
  'within-target': 'Within target',
  'outside-target': 'Outside target',
  waived: 'Waived',
};

export const approvalKeys = {
  all: ['approvals'] as const,
  readiness: (machineId: string) => [...approvalKeys.all, 'readiness', machineId] as const,
  drift: (machineId: string) => [...approvalKeys.all, 'drift', machineId] as const,
};

export const certificateUrl = (machineId: string, approvalId?: string) =>
  `/api/machines/${machineId}/certificate.pdf${approvalId ? `?approval=${approvalId}` : ''}`;
