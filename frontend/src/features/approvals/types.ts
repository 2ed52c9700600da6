import type { AnswerOf, Schemas } from '../../lib/api/schemas';
import { CHECK_KIND_LABELS, type CheckKind } from '../../lib/record-kinds';

export type Readiness = AnswerOf<'/api/machines/{id}/readiness', 'get'>;
export type BoardCheck = Readiness['checks'][number];
export type CheckStatus = BoardCheck['status'];
/** The check kinds and their words come from one list shared with the server's (lib/record-kinds.ts). */
export type { CheckKind };
export type Target = NonNullable<BoardCheck['target']>;
export type Waiver = Schemas['WaiverInfo'];
/** A machine's screen as the server names it: its file on a tab, one of its rails or one of its axes; checkPath() makes the link. */
export type CheckPlace = BoardCheck['place'];
export type CheckWarning = Schemas['ResultWarning'];
export type BlockingCheck = Readiness['blocking'][number];
export type Approval = Schemas['ApprovalResponse'];
export type DriftSide = Schemas['DriftSide'];

/** What drifted since the latest approval: each check's approved result beside its latest (no approval: null, no rows). */
export type Drift = Schemas['DriftResponse'];
export type DriftRow = Schemas['DriftRow'];

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
