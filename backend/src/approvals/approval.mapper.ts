import type { ApprovalRow, RequestRow } from './approvals.repository.js';
import type { BoardCheck } from './snapshot.js';

export interface ApprovalResponse {
  id: string;
  approvedAt: string;
  approvedBy: string;
  recordHash: string;
  statement: string;
  recheckDueAt: string;
  recheckIntervalDays: number;
}

export const toApprovalResponse = (a: ApprovalRow): ApprovalResponse => ({
  id: a.id,
  approvedAt: a.approvedAt.toISOString(),
  approvedBy: a.approvedByName,
  recordHash: a.recordHash,
  statement: a.statement,
  recheckDueAt: a.recheckDueAt.toISOString(),
  recheckIntervalDays: a.recheckIntervalDays,
});

export const toRequestResponse = (r: RequestRow) => ({ id: r.id, requestedAt: r.requestedAt.toISOString(), requestedBy: r.requestedByName });

/** A check on the board; the chart series stay in the snapshot, not in this light response. */
export function toCheckResponse(c: BoardCheck) {
  const { series: _series, ...rest } = c;
  return { ...rest, hasSeries: !!c.series };
}

export const toBlocking = (c: BoardCheck) => ({ key: c.key, kind: c.kind, subject: c.subject, status: c.status });
