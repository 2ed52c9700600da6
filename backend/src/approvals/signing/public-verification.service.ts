import { Injectable, NotFoundException } from '@nestjs/common';
import { toPublicVerificationResponse } from '../approval.mapper.js';
import type { ApprovalRow } from '../approvals.repository.js';
import { SignedRecordService } from './signed-record.service.js';
import { SignedRecordsRepository } from './signed-records.repository.js';

// The tokens made at approval are 24 random bytes in base64url; anything else cannot be one.
const TOKEN = /^[A-Za-z0-9_-]{20,100}$/;
const UNKNOWN = 'No approval has this verification address: check that it was copied in full from the certificate.';

/** Verification for anyone holding a certificate, without an account, by the certificate's token only. */
@Injectable()
export class PublicVerificationService {
  constructor(
    private readonly rows: SignedRecordsRepository,
    private readonly signatures: SignedRecordService,
  ) {}

  async verify(token: string) {
    const a = await this.approval(token);
    return toPublicVerificationResponse(a, await this.signatures.verify(a));
  }

  async record(token: string) {
    const a = await this.approval(token);
    if (!a.signature)
      throw new NotFoundException(
        'This approval was signed before signatures were kept: it has no signed record to download.',
      );
    return {
      record: await this.signatures.publicRecord(a),
      filename: `railwright-signed-record-${a.approvedAt.toISOString().slice(0, 10)}-${a.id.slice(0, 8)}.json`,
    };
  }

  publicKey(): string {
    return this.signatures.publicKeyPem;
  }

  private async approval(token: string): Promise<ApprovalRow> {
    const a = TOKEN.test(token) ? await this.rows.byToken(token) : null;
    if (!a) throw new NotFoundException(UNKNOWN);
    return a;
  }
}
