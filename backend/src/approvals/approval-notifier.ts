import { Injectable } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { MailLinks } from '../mail/mail-links.js';
import { MailService } from '../mail/mail.service.js';
import { approvalRequestedMail, approvedMail, recheckDueMail, reopenedMail } from './approval-mails.js';
import { ApprovalsRepository, type ApprovalRow } from './approvals.repository.js';
import { CertificateService } from './certificate/certificate.service.js';
import type { BoardCheck } from './snapshot.js';

/** Who hears of what: owners of a request, the whole workshop of an approval, owners and technicians of a re-check. */
@Injectable()
export class ApprovalNotifier {
  constructor(
    private readonly repo: ApprovalsRepository,
    private readonly mail: MailService,
    private readonly certificates: CertificateService,
    private readonly links: MailLinks,
  ) {}

  async approvalRequested(actor: SessionUser, machineName: string, machineId: string, checks: BoardCheck[]) {
    const owners = (await this.repo.members(actor.workshopId)).filter((m) => m.role === 'owner');
    const { subject, text } = approvalRequestedMail({
      machineName,
      workshopName: actor.workshopName,
      requestedBy: actor.name,
      url: this.links.machine(machineId, 'readiness'),
      checkCount: checks.length,
      waivedCount: checks.filter((c) => c.status === 'waived').length,
    });
    await this.mail.send({ workshopId: actor.workshopId, to: owners.map((o) => o.email), subject, text });
  }

  /** `approval` is the sealed row: its certificate carries the verification address of the signature. */
  async approved(actor: SessionUser, approval: ApprovalRow) {
    const everyone = await this.repo.members(actor.workshopId);
    const pdf = await this.certificates.render(approval);
    const { subject, text } = approvedMail({
      snapshot: approval.snapshot,
      approvedBy: approval.approvedByName,
      approvedAt: approval.approvedAt,
      recordHash: approval.recordHash,
      recheckDueAt: approval.recheckDueAt,
      url: this.links.machine(approval.machineId, 'readiness'),
    });
    const check = approval.verificationToken
      ? `\n\nAnyone holding the certificate can check its signature, without an account:\n${this.links.verification(approval.verificationToken)}`
      : '';
    await this.mail.send({
      workshopId: actor.workshopId,
      to: everyone.map((m) => m.email),
      subject,
      text: text + check,
      attachments: [{ filename: this.certificates.filename(approval), content: pdf, contentType: 'application/pdf' }],
    });
  }

  async recheckDue(approval: ApprovalRow, machineName: string) {
    const people = (await this.repo.members(approval.workshopId)).filter(
      (m) => m.role === 'owner' || m.role === 'technician',
    );
    const { subject, text } = recheckDueMail({
      machineName,
      workshopName: approval.snapshot.workshop.name,
      approvedAt: approval.approvedAt,
      recheckDueAt: approval.recheckDueAt,
      url: this.links.machine(approval.machineId, 'readiness'),
    });
    await this.mail.send({ workshopId: approval.workshopId, to: people.map((p) => p.email), subject, text });
  }

  /** Everyone who recorded for, requested or signed the approval, and the workshop's owners. */
  async reopened(actor: SessionUser, approval: ApprovalRow, machineName: string, reason: string) {
    const people = (await this.repo.members(actor.workshopId)).filter(
      (m) => m.role === 'owner' || m.role === 'technician' || m.role === 'builder' || m.id === approval.approvedById,
    );
    const { subject, text } = reopenedMail({
      machineName,
      workshopName: actor.workshopName,
      reopenedBy: actor.name,
      reason,
      approvedAt: approval.approvedAt,
      url: this.links.machine(approval.machineId, 'readiness'),
    });
    await this.mail.send({ workshopId: actor.workshopId, to: people.map((p) => p.email), subject, text });
  }
}
