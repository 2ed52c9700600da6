import { BadRequestException, ConflictException, ForbiddenException, Injectable, OnModuleInit } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { AuthService } from '../auth/auth.service.js';
import { APPROVED_STATES, type MachineState } from '../database/schema/machines.js';
import { randomBytes } from 'node:crypto';
import { TargetSetsService } from '../target-sets/target-sets.service.js';
import { SignedRecordService } from './signing/signed-record.service.js';
import { MachinesService } from '../machines/machines.service.js';
import { RecordsService, type CheckRecordedEvent } from '../records/records.service.js';
import { MailService } from '../mail/mail.service.js';
import { ApprovalNotifier } from './approval-notifier.js';
import { ApprovalsRepository } from './approvals.repository.js';
import { toApprovalResponse, toBlocking, toCheckResponse, toRequestResponse } from './approval.mapper.js';
import { KIND_LABELS } from './board.js';
import { ReadinessBoardService } from './readiness-board.service.js';
import { snapshotHash } from './snapshot.js';
import { defaultStatement } from './statement.js';
import { cautionsFor } from './cautions.js';
import type { ApproveDto } from './dto/approve.dto.js';
import type { WaiverDto } from './dto/waiver.dto.js';
import type { ReopenDto } from './dto/reopen.dto.js';

const DAY_MS = 24 * 3600_000;

/** The owner's job: the board, waivers, approval requests, signed approvals and what undoes them. */
@Injectable()
export class ApprovalsService implements OnModuleInit {
  constructor(
    private readonly repo: ApprovalsRepository,
    private readonly board: ReadinessBoardService,
    private readonly machines: MachinesService,
    private readonly records: RecordsService,
    private readonly auth: AuthService,
    private readonly notifier: ApprovalNotifier,
    private readonly mail: MailService,
    private readonly targetSets: TargetSetsService,
    private readonly signatures: SignedRecordService,
  ) {}

  onModuleInit() {
    this.records.onCheckRecorded((actor, event) => this.onCheckRecorded(actor, event));
  }

  async readiness(actor: SessionUser, machineId: string) {
    // Another workshop's machine is a 404 from the board's first statement, which also gives the
    // state the machine reads as now (re-check due once the date has passed; nothing is written).
    const b = await this.board.board(actor, machineId);
    const { approval, request } = await this.repo.latestApprovalAndOpenRequest(actor.workshopId, machineId);
    return {
      machineId,
      state: b.machine.state,
      checks: b.checks.map(toCheckResponse),
      blocking: b.blocking.map(toBlocking),
      counts: countsOf(b.checks),
      approval: approval ? toApprovalResponse(approval) : null,
      request: request ? toRequestResponse(request) : null,
      recheckDueAt:
        approval && ['ready-to-cut', 'recheck-due'].includes(b.machine.state)
          ? approval.recheckDueAt.toISOString()
          : null,
      targetSet: b.targetSet,
      defaultStatement: defaultStatement(b.machine.name, b.targetSet.name),
      cautions: cautionsFor(b.machine.kind).map(({ title, text }) => ({ title, text })),
    };
  }

  async waive(actor: SessionUser, machineId: string, checkKey: string, dto: WaiverDto) {
    await this.machines.lockForChange(actor, machineId);
    const b = await this.board.board(actor, machineId);
    const check = b.checks.find((c) => c.key === checkKey);
    if (!check) throw new BadRequestException([`checkId "${checkKey}" is not a required check of this machine`]);
    if (check.kind === 'safety-walk') {
      throw new ConflictException(
        'The safety walk cannot be waived: put right what was answered "no" and answer it again (items that do not apply can be answered "not applicable")',
      );
    }
    if (check.measuredStatus === 'within-target')
      throw new ConflictException(
        `${check.subject}: ${KIND_LABELS[check.kind].toLowerCase()} is within target and needs no waiver`,
      );
    if (check.status === 'waived')
      throw new ConflictException(
        `${check.subject}: ${KIND_LABELS[check.kind].toLowerCase()} is already waived for its current record`,
      );
    if (b.machine.state === 'awaiting-approval')
      throw new ConflictException(
        'The machine is awaiting approval: waive before requesting it, or record the check again',
      );
    const row = await this.repo.insertWaiver({
      workshopId: actor.workshopId,
      machineId,
      checkKey,
      recordType: check.recordType,
      recordId: check.recordId,
      reason: dto.reason,
      waivedById: actor.id,
      waivedByName: actor.name,
    });
    await this.records.audit(actor, {
      machineId,
      recordType: 'waiver',
      recordId: row.id,
      action: 'created',
      summary: `Waived the ${KIND_LABELS[check.kind].toLowerCase()} (${check.subject}): ${dto.reason}`,
      changes: { check: checkKey, status: { from: check.measuredStatus, to: 'waived' }, reason: dto.reason },
    });
    return {
      id: row.id,
      checkKey,
      reason: row.reason,
      waivedBy: row.waivedByName,
      waivedAt: row.waivedAt.toISOString(),
      recordId: row.recordId,
    };
  }

  async requestApproval(actor: SessionUser, machineId: string) {
    const machine = await this.machines.lockForCommand(actor, machineId);
    refuseUnlessState(machine.state, ['being-built', 'reopened'], 'request approval');
    const b = await this.board.board(actor, machineId);
    if (!b.checks.length)
      throw new ConflictException({ message: 'No required checks are reported for this machine yet', blocking: [] });
    if (b.blocking.length) {
      throw new ConflictException({
        message: `${b.blocking.length} check${b.blocking.length === 1 ? '' : 's'} must be within target or waived first: ${b.blocking.map((c) => `${KIND_LABELS[c.kind]} (${c.subject})`).join(', ')}`,
        blocking: b.blocking.map(toBlocking),
      });
    }
    const request = await this.repo.insertRequest({
      workshopId: actor.workshopId,
      machineId,
      requestedById: actor.id,
      requestedByName: actor.name,
    });
    await this.changeState(actor, machineId, machine.state, 'awaiting-approval', `${actor.name} requested approval`);
    this.mail.later(
      () => this.notifier.approvalRequested(actor, b.machine.name, machineId, b.checks),
      'approval-requested mail',
    );
    return { ...toRequestResponse(request), state: 'awaiting-approval' as const };
  }

  async approve(actor: SessionUser, machineId: string, dto: ApproveDto) {
    const machine = await this.machines.lockForCommand(actor, machineId);
    refuseUnlessState(machine.state, ['awaiting-approval'], 'approve');
    if (!(await this.auth.confirmPassword(actor.id, dto.password))) {
      throw new ForbiddenException('That password is not right: re-enter your own password to sign the approval');
    }
    const request = await this.repo.openRequest(actor.workshopId, machineId);
    const { snapshot, blocking } = await this.board.snapshot(actor, machineId);
    if (!request || blocking.length) {
      throw new ConflictException({
        message: `The machine can no longer be approved: ${blocking.map((c) => `${KIND_LABELS[c.kind]} (${c.subject})`).join(', ') || 'its request was closed'}`,
        blocking: blocking.map(toBlocking),
      });
    }
    const approvedAt = new Date(Math.floor(Date.now() / 1000) * 1000);
    const interval = snapshot.targetSet.recheckIntervalDays;
    const targetSet = await this.targetSets.findRow(actor.workshopId, machine.targetSetId);
    const inserted = await this.repo.insertApproval(request.id, {
      workshopId: actor.workshopId,
      machineId,
      requestId: request.id,
      approvedById: actor.id,
      approvedByName: actor.name,
      approvedAt,
      statement: dto.statement,
      snapshot,
      recordHash: snapshotHash(snapshot),
      recheckIntervalDays: interval,
      recheckDueAt: new Date(approvedAt.getTime() + interval * DAY_MS),
      targetValues: targetSet.targets,
      verificationToken: randomBytes(24).toString('base64url'),
    });
    if (!inserted)
      throw new ConflictException({ message: 'Someone else has just approved or closed this request', blocking: [] });
    await this.records.lock(inserted.id, [
      { recordType: 'machine', recordId: machineId },
      ...(await this.repo.partsOf(machineId)),
      ...snapshot.checks
        .filter((c) => c.recordType && c.recordId)
        .map((c) => ({ recordType: c.recordType!, recordId: c.recordId! })),
      ...snapshot.checks
        .filter((c) => c.waiver)
        .map((c) => ({ recordType: 'waiver' as const, recordId: c.waiver!.id })),
    ]);
    const row = await this.signatures.seal(inserted);
    await this.records.audit(actor, {
      machineId,
      recordType: 'approval',
      recordId: row.id,
      action: 'approved',
      summary: `${actor.name} approved the machine as ready to cut (record hash ${row.recordHash.slice(0, 12)}…, re-check due ${row.recheckDueAt.toISOString().slice(0, 10)})`,
      changes: {
        recordHash: row.recordHash,
        checks: snapshot.checks.length,
        waived: snapshot.checks.filter((c) => c.status === 'waived').length,
      },
    });
    await this.changeState(actor, machineId, 'awaiting-approval', 'ready-to-cut', 'Approved as ready to cut');
    this.mail.later(() => this.notifier.approved(actor, row), 'approved mail');
    const response = toApprovalResponse(row);
    return {
      id: response.id,
      approvedAt: response.approvedAt,
      approvedBy: response.approvedBy,
      recordHash: response.recordHash,
      recheckDueAt: response.recheckDueAt,
    };
  }

  /**
   * The owner takes back a standing approval to change the machine: audited, mailed, and the
   * machine is "reopened" (not "being built") until it is approved again.
   */
  async reopen(actor: SessionUser, machineId: string, dto: ReopenDto) {
    const machine = await this.machines.lockForCommand(actor, machineId);
    refuseUnlessState(machine.state, APPROVED_STATES, 'reopen');
    const approval = await this.repo.standingApproval(actor.workshopId, machineId);
    if (!approval) throw new ConflictException({ message: 'No approval of this machine stands', blocking: [] });
    const ended = await this.repo.endApproval(approval.id, {
      endedAt: new Date(),
      endedById: actor.id,
      endedByName: actor.name,
      endReason: dto.reason,
    });
    await this.records.audit(actor, {
      machineId,
      recordType: 'approval',
      recordId: approval.id,
      action: 'reopened',
      summary: `${actor.name} reopened the machine for changes: ${dto.reason}`,
      changes: {
        reason: dto.reason,
        approvedAt: approval.approvedAt.toISOString(),
        approvedBy: approval.approvedByName,
      },
    });
    await this.changeState(
      actor,
      machineId,
      machine.state,
      'reopened',
      `Reopened for changes: the approval of ${approval.approvedAt.toISOString().slice(0, 10)} no longer stands`,
    );
    this.mail.later(() => this.notifier.reopened(actor, approval, machine.name, dto.reason), 'reopened mail');
    return { state: 'reopened' as const, approval: toApprovalResponse(ended) };
  }

  /** A check recorded outside target while approval is awaited closes the request. */
  private async onCheckRecorded(actor: SessionUser, event: CheckRecordedEvent) {
    if (event.status !== 'outside-target') return;
    const machine = await this.machines.lockForCommand(actor, event.machineId);
    if (machine.state !== 'awaiting-approval') return;
    await this.repo.closeOpenRequests(actor.workshopId, machine.id);
    const to: MachineState = (await this.repo.latestApproval(actor.workshopId, machine.id))
      ? 'reopened'
      : 'being-built';
    const what = KIND_LABELS[event.kind];
    await this.changeState(
      actor,
      machine.id,
      machine.state,
      to,
      `${what} recorded outside target: the request for approval is closed`,
    );
  }

  private async changeState(
    actor: SessionUser,
    machineId: string,
    from: MachineState,
    to: MachineState,
    summary: string,
  ) {
    await this.machines.setState(actor.workshopId, machineId, to);
    await this.records.audit(actor, {
      machineId,
      recordType: 'machine',
      recordId: machineId,
      action: 'state-changed',
      summary,
      changes: { state: { from, to } },
    });
  }
}

const STATE_WORDS: Record<MachineState, string> = {
  'being-built': 'being built',
  'awaiting-approval': 'already awaiting approval',
  'ready-to-cut': 'already approved and ready to cut',
  'recheck-due': 'approved and due for its re-check',
  reopened: 'reopened for changes',
  retired: 'retired',
};

function refuseUnlessState(state: MachineState, allowed: readonly MachineState[], what: string) {
  if (allowed.includes(state)) return;
  const hint =
    what === 'approve'
      ? ' A technician, owner or admin requests approval first.'
      : APPROVED_STATES.includes(state)
        ? ' The owner reopens it with a reason first.'
        : '';
  throw new ConflictException({
    message: `Cannot ${what}: the machine is ${STATE_WORDS[state]}.${hint}`,
    blocking: [],
  });
}

function countsOf(checks: { status: string }[]) {
  const n = (s: string) => checks.filter((c) => c.status === s).length;
  return {
    /** Count of required checks. */
    total: checks.length,
    /** Count of checks within their targets. */
    within: n('within-target'),
    /** Count of checks outside their targets. */
    outside: n('outside-target'),
    /** Count of checks waived. */
    waived: n('waived'),
    /** Count of checks not yet recorded. */
    notStarted: n('not-started'),
  };
}
