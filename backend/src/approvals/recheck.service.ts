import { Injectable, Logger } from '@nestjs/common';
import { Cron, CronExpression } from '@nestjs/schedule';
import { TransactionContext } from '../database/transaction-context.js';
import { MailService } from '../mail/mail.service.js';
import { RecordsService, type AuditActor } from '../records/records.service.js';
import { ApprovalNotifier } from './approval-notifier.js';
import { ApprovalsRepository } from './approvals.repository.js';

/** Scheduled work has no person behind it; the history names the product instead. */
const scheduler = (workshopId: string): AuditActor => ({
  id: null,
  name: 'Railwright (re-check schedule)',
  workshopId,
});

/**
 * The reminder that an approval's re-check has fallen due. A machine reads as re-check due by
 * itself once the date has passed (see machines/machine-state.ts); this job only tells people,
 * once per approval: marking the reminder sent, its history entry and the mail (after commit) are
 * one transaction per approval, and the mark is taken by one instance only.
 */
@Injectable()
export class RecheckService {
  private readonly logger = new Logger(RecheckService.name);

  constructor(
    private readonly repo: ApprovalsRepository,
    private readonly records: RecordsService,
    private readonly notifier: ApprovalNotifier,
    private readonly mail: MailService,
    private readonly transactions: TransactionContext,
  ) {}

  @Cron(CronExpression.EVERY_HOUR, { name: 'recheck-reminders' })
  async scheduled(): Promise<void> {
    try {
      await this.remindDue();
    } catch (err) {
      this.logger.error(`re-check reminders failed: ${(err as Error).message}`);
    }
  }

  /** Sends the reminder of every approval fallen due since the last run; the number sent. */
  async remindDue(now = new Date()): Promise<number> {
    let sent = 0;
    for (const { approval, machineName } of await this.repo.dueRecheckReminders(now)) {
      const actor = scheduler(approval.workshopId);
      const claimed = await this.transactions.run(
        async () => {
          if (!(await this.repo.markRecheckNotified(approval.id, now))) return false;
          await this.records.audit(actor, {
            machineId: approval.machineId,
            recordType: 'machine',
            recordId: approval.machineId,
            action: 'state-changed',
            summary: `Re-check due: the approval of ${approval.approvedAt.toISOString().slice(0, 10)} asked for a re-check by ${approval.recheckDueAt.toISOString().slice(0, 10)}`,
            changes: { state: { from: 'ready-to-cut', to: 'recheck-due' } },
          });
          this.mail.later(() => this.notifier.recheckDue(approval, machineName), 're-check due mail');
          return true;
        },
        { actor },
      );
      if (claimed) sent++;
    }
    return sent;
  }
}
