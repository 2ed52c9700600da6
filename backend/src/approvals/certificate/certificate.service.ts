import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { SessionUser } from '../../auth/session-user.js';
import { MachinesService } from '../../machines/machines.service.js';
import { ApprovalsRepository, type ApprovalRow } from '../approvals.repository.js';
import { toApprovalResponse, toVerificationResponse } from '../approval.mapper.js';
import { SignedRecordService } from '../signing/signed-record.service.js';
import { MailLinks } from '../../mail/mail-links.js';
import { renderCertificate } from './certificate-pdf.js';

/** The certificate of an approval, made from its stored snapshot only (never from live data). */
@Injectable()
export class CertificateService {
  constructor(
    private readonly repo: ApprovalsRepository,
    private readonly machines: MachinesService,
    private readonly signatures: SignedRecordService,
    private readonly links: MailLinks,
  ) {}

  render(a: ApprovalRow): Promise<Buffer> {
    return renderCertificate({
      snapshot: a.snapshot,
      approval: {
        id: a.id,
        approvedAt: a.approvedAt,
        approvedBy: a.approvedByName,
        statement: a.statement,
        recordHash: a.recordHash,
        recheckDueAt: a.recheckDueAt,
      },
      verificationUrl: a.verificationToken ? this.links.verification(a.verificationToken) : null,
    });
  }

  filename(a: ApprovalRow): string {
    const name =
      a.snapshot.machine.name
        .toLowerCase()
        .replace(/[^a-z0-9]+/g, '-')
        .replace(/^-|-$/g, '') || 'machine';
    return `commissioning-certificate-${name}-${a.approvedAt.toISOString().slice(0, 10)}.pdf`;
  }

  async forMachine(actor: SessionUser, machineId: string, approvalId?: string) {
    const machine = await this.machines.getRef(actor, machineId);
    const a = approvalId
      ? await this.repo.approval(actor.workshopId, machineId, approvalId)
      : await this.repo.latestApproval(actor.workshopId, machineId);
    if (!a && approvalId) throw new NotFoundException('No such approval of this machine');
    if (!a)
      throw new ConflictException(`${machine.name} has not been approved yet, so it has no commissioning certificate`);
    return { pdf: await this.render(a), filename: this.filename(a) };
  }

  async list(actor: SessionUser, machineId: string) {
    await this.machines.getRef(actor, machineId);
    return (await this.repo.listApprovals(actor.workshopId, machineId)).map(toApprovalResponse);
  }

  /** Checks the owner's signature against the machine's records as they are now, naming what differs. */
  async verify(actor: SessionUser, machineId: string, approvalId: string) {
    await this.machines.getRef(actor, machineId);
    const a = await this.repo.approval(actor.workshopId, machineId, approvalId);
    if (!a) throw new NotFoundException('No such approval of this machine');
    return toVerificationResponse(a, await this.signatures.verify(a));
  }
}
