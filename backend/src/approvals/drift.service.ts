import { Injectable } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { ApprovalsRepository } from './approvals.repository.js';
import { ReadinessBoardService } from './readiness-board.service.js';
import type { BoardCheck } from './snapshot.js';

export interface DriftSide {
  status: BoardCheck['status'];
  result: BoardCheck['result'];
  recordId: string | null;
  recordedAt: string | null;
}

/** One check: what the approval stood on beside its latest result. */
export interface DriftRow {
  key: string;
  kind: BoardCheck['kind'];
  subject: string;
  target: BoardCheck['target'];
  approved: DriftSide | null;
  latest: DriftSide | null;
  /** Latest minus approved, in the `unit` beside it; null when either is missing or nothing new was recorded. */
  change: number | null;
  unit: string | null;
  rechecked: boolean;
  worse: boolean;
}

/** The approval the drift is measured from. */
export interface DriftApproval {
  id: string;
  approvedAt: string;
  approvedBy: string;
  recordHash: string;
}

/** "What drifted" since the latest approval (no approval: null and no rows). */
export interface DriftResponse {
  approval: DriftApproval | null;
  rows: DriftRow[];
}

const side = (c: BoardCheck | undefined): DriftSide | null =>
  c ? { status: c.status, result: c.result, recordId: c.recordId, recordedAt: c.recordedAt } : null;

/** "What drifted": the approved round (from the approval snapshot) beside the latest result of each check. */
@Injectable()
export class DriftService {
  constructor(
    private readonly repo: ApprovalsRepository,
    private readonly board: ReadinessBoardService,
  ) {}

  async compare(actor: SessionUser, machineId: string): Promise<DriftResponse> {
    const b = await this.board.board(actor, machineId);
    const approval = await this.repo.latestApproval(actor.workshopId, machineId);
    if (!approval) return { approval: null, rows: [] };
    const approved = new Map(approval.snapshot.checks.map((c) => [c.key, c]));
    const latest = new Map(b.checks.map((c) => [c.key, c]));
    const keys = [
      ...approval.snapshot.checks.map((c) => c.key),
      ...b.checks.map((c) => c.key).filter((k) => !approved.has(k)),
    ];
    const rows = keys.map((key): DriftRow => {
      const a = approved.get(key);
      const l = latest.get(key);
      const ref = l ?? a!;
      const sameRecord = !!a && !!l && a.recordId === l.recordId;
      const change =
        a?.result && l?.result && a.result.unit === l.result.unit && !sameRecord
          ? round(l.result.value - a.result.value)
          : null;
      return {
        key,
        kind: ref.kind,
        subject: ref.subject,
        target: ref.target,
        approved: side(a),
        latest: side(l),
        change,
        unit: ref.result?.unit ?? a?.result?.unit ?? null,
        rechecked: !!l?.recordId && !sameRecord,
        worse: !!l && l.status === 'outside-target' && a?.status !== 'outside-target',
      };
    });
    return {
      approval: {
        id: approval.id,
        approvedAt: approval.approvedAt.toISOString(),
        approvedBy: approval.approvedByName,
        recordHash: approval.recordHash,
      },
      rows,
    };
  }
}

const round = (v: number) => Math.round(v * 1e6) / 1e6;
