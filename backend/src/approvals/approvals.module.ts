import { Module } from '@nestjs/common';
import { MachinesModule } from '../machines/machines.module.js';
import { MailModule } from '../mail/mail.module.js';
import { ApprovalNotifier } from './approval-notifier.js';
import { ApprovalsController } from './approvals.controller.js';
import { ApprovalsRepository } from './approvals.repository.js';
import { ApprovalsService } from './approvals.service.js';
import { CertificateService } from './certificate/certificate.service.js';
import { DriftService } from './drift.service.js';
import { ReadinessBoardService } from './readiness-board.service.js';
import { RecheckService } from './recheck.service.js';
import { SignedRecordService } from './signing/signed-record.service.js';
import { SignedRecordsRepository } from './signing/signed-records.repository.js';
import { SigningKeyService } from './signing/signing-key.service.js';
import { PublicVerificationService } from './signing/public-verification.service.js';
import { PublicVerificationController } from './public-verification.controller.js';

@Module({
  imports: [MachinesModule, MailModule],
  controllers: [ApprovalsController, PublicVerificationController],
  providers: [
    ApprovalsRepository,
    ApprovalsService,
    ReadinessBoardService,
    ApprovalNotifier,
    CertificateService,
    DriftService,
    RecheckService,
    SignedRecordService,
    SignedRecordsRepository,
    SigningKeyService,
    PublicVerificationService,
  ],
  exports: [ApprovalsService],
})
export class ApprovalsModule {}
