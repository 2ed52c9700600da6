import { Injectable, Logger, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { MachinesService } from '../machines/machines.service.js';
import { RecordsService } from '../records/records.service.js';
import { ApprovalNotifier } from './approval-notifier.js';
import { ApprovalsRepository } from './approvals.repository.js';

const HOUR_MS = 3600_000;

/** Scheduled work has no person behind it; the history names the product instead. */
const scheduler = (workshopId: string): SessionUser =>
  ({ id: null, name: 'Railwright (re-check schedule)', email: '', role: 'admin', workshopId, workshopName: '' }) as unknown as SessionUser;

/**
 * Moves approved machines to re-check due when their date passes, and sends the one e-mail per
 * due date. Runs at start, every hour, and whenever a workshop's machines are read.
 */
@Injectable()
export class RecheckService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(RecheckService.name);
  private timer: NodeJS.Timeout | null = null;

  constructor(
    private readonly repo: ApprovalsRepository,
    private readonly machines: MachinesService,
    private readonly records: RecordsService,
    private readonly notifier: ApprovalNotifier,
  ) {}

  onApplicationBootstrap() {
    this.machines.onRecheckDue((workshopId) => this.sweepWorkshop(workshopId));
    void this.sweep(null);
    this.timer = setInterval(() => void this.sweep(null), HOUR_MS);
    this.timer.unref();
  }

  onModuleDestroy() {
    if (this.timer) clearInterval(this.timer);
  }

  sweepWorkshop(workshopId: string): Promise<void> {
    return this.sweep(workshopId);
  }

  private async sweep(workshopId: string | null): Promise<void> {
    try {
      const now = Date.now();
      for (const { approval, state, machineName } of await this.repo.latestApprovalsOfMachinesIn(workshopId, ['ready-to-cut', 'recheck-due'])) {
        if (approval.recheckDueAt.getTime() > now) continue;
        if (state === 'ready-to-cut') {
          const actor = scheduler(approval.workshopId);
          await this.machines.setState(approval.workshopId, approval.machineId, 'recheck-due');
          await this.records.audit(actor, {
            machineId: approval.machineId,
            recordType: 'machine',
            recordId: approval.machineId,
            action: 'state-changed',
            summary: `Re-check due: the approval of ${approval.approvedAt.toISOString().slice(0, 10)} asked for a re-check by ${approval.recheckDueAt.toISOString().slice(0, 10)}`,
            changes: { state: { from: 'ready-to-cut', to: 'recheck-due' } },
          });
        }
        if (await this.repo.markRecheckNotified(approval.id)) await this.notifier.recheckDue(approval, machineName);
      }
    } catch (err) {
      this.logger.error(`re-check sweep failed: ${(err as Error).message}`);
    }
  }
}
