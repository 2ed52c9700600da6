import type { ApprovalRow, RequestRow } from './approvals.repository.js';
import type { BoardCheck } from './snapshot.js';
import type { Verification } from './signing/signed-record.service.js';
import { SIGNING_ALGORITHM } from './signing/signing-key.service.js';

export interface ApprovalResponse {
  id: string;
  approvedAt: string;
  approvedBy: string;
  recordHash: string;
  statement: string;
  recheckDueAt: string;
  recheckIntervalDays: number;
  /** The approval stands and its re-check date has passed (worked out when read, never stored). */
  recheckDue: boolean;
  /** Token of the public verification page printed on the certificate; null before signatures were kept. */
  verificationToken: string | null;
  /** Set once the owner reopened the machine: the approval no longer stands. */
  reopened: { at: string; by: string | null; reason: string | null } | null;
}

/** A standing approval whose re-check date has passed, at `now`. */
export const recheckDue = (a: Pick<ApprovalRow, 'endedAt' | 'recheckDueAt'>, now = new Date()): boolean =>
  !a.endedAt && a.recheckDueAt.getTime() <= now.getTime();

export const toApprovalResponse = (a: ApprovalRow): ApprovalResponse => ({
  id: a.id,
  approvedAt: a.approvedAt.toISOString(),
  approvedBy: a.approvedByName,
  recordHash: a.recordHash,
  statement: a.statement,
  recheckDueAt: a.recheckDueAt.toISOString(),
  recheckIntervalDays: a.recheckIntervalDays,
  recheckDue: recheckDue(a),
  verificationToken: a.verificationToken ?? null,
  reopened: a.endedAt ? { at: a.endedAt.toISOString(), by: a.endedByName, reason: a.endReason } : null,
});

export const toRequestResponse = (r: RequestRow) => ({
  id: r.id,
  requestedAt: r.requestedAt.toISOString(),
  requestedBy: r.requestedByName,
});

/** A check on the board; the chart series stay in the snapshot, not in this light response. */
export function toCheckResponse(c: BoardCheck) {
  const { series: _series, ...rest } = c;
  return { ...rest, hasSeries: !!c.series };
}

export const toBlocking = (c: BoardCheck) => ({ key: c.key, kind: c.kind, subject: c.subject, status: c.status });

/** The outcome of checking an approval's signature against the live records, with who signed and when. */
export const toVerificationResponse = (a: ApprovalRow, v: Verification) => ({
  approvalId: a.id,
  status: v.status,
  valid: v.valid,
  unchanged: v.unchanged,
  message: v.message,
  signedBy: a.approvedByName,
  signedAt: a.approvedAt.toISOString(),
  algorithm: SIGNING_ALGORITHM,
  keyId: v.keyId,
  signedCopyIntact: v.signedCopyIntact,
  differences: v.differences,
  /** Count of differences found beyond those listed in `differences`. */
  moreDifferences: v.moreDifferences,
  recordHash: a.recordHash,
  stands: !a.endedAt,
  reopened: a.endedAt ? { at: a.endedAt.toISOString(), by: a.endedByName, reason: a.endReason } : null,
});

/** What anyone holding the certificate sees: the approval as printed and whether it can be trusted. */
export const toPublicVerificationResponse = (a: ApprovalRow, v: Verification) => ({
  ...toVerificationResponse(a, v),
  machine: { name: a.snapshot.machine.name, kind: a.snapshot.machine.kind },
  workshop: a.snapshot.workshop.name,
  statement: a.statement,
  recheckDueAt: a.recheckDueAt.toISOString(),
  recheckIntervalDays: a.recheckIntervalDays,
  recheckDue: recheckDue(a),
  targetSet: a.snapshot.targetSet.name,
  /** Count of checks the approval stands on. */
  checkCount: a.snapshot.checks.length,
  /** Count of those checks that were waived. */
  waivedCount: a.snapshot.checks.filter((c) => c.status === 'waived').length,
});
