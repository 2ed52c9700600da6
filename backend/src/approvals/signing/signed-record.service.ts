import { Injectable } from '@nestjs/common';
import { ApprovalsRepository, type ApprovalRow } from '../approvals.repository.js';
import { recordDifferences, type RecordDifference } from './record-diff.js';
import { signedContent, type LiveRecord } from './signed-content.js';
import { isSignedRecordKind, SIGNED_RECORD_KINDS } from './signed-record-kinds.js';
import { upgradeSignedContent } from './signed-record-upgrades.js';
import { SignedRecordsRepository } from './signed-records.repository.js';
import { SIGNING_ALGORITHM, SigningKeyService } from './signing-key.service.js';

/** Enough differences to see what was changed without sending a whole record back. */
const MAX_DIFFERENCES = 50;

export type VerificationStatus = 'valid' | 'changed' | 'unsigned' | 'unknown-key';

export interface Verification {
  status: VerificationStatus;
  /** The signature checks out over the record as it is now in the database. */
  valid: boolean;
  /** The record is as signed; null when that cannot be told (signed before signatures were kept). */
  unchanged: boolean | null;
  message: string;
  keyId: string | null;
  /** Whether the kept copy of the signed record still matches its signature (null when unsigned). */
  signedCopyIntact: boolean | null;
  differences: RecordDifference[];
  moreDifferences: number;
}

/** Signs an approval's record with the server's key and checks it against the live records. */
@Injectable()
export class SignedRecordService {
  constructor(
    private readonly rows: SignedRecordsRepository,
    private readonly approvals: ApprovalsRepository,
    private readonly key: SigningKeyService,
  ) {}

  /** Signs the approval's record as it is now; called in the approving command's transaction, after its locks. */
  async seal(approval: ApprovalRow): Promise<ApprovalRow> {
    const content = await this.liveContent(approval);
    return this.approvals.setSignature(approval.id, {
      signature: this.key.sign(content),
      signingKeyId: this.key.keyId,
      signedContent: content,
    });
  }

  /** The canonical record, recomputed from the approval's row and every record it stands on as they are now. */
  async liveContent(approval: ApprovalRow): Promise<string> {
    const live = (await this.rows.reload(approval.id)) ?? approval;
    const locks = await this.rows.locksOf(approval.id);
    const records: LiveRecord[] = [];
    for (const kind of SIGNED_RECORD_KINDS) {
      const ids = [...new Set(locks.filter((l) => l.recordType === kind).map((l) => l.recordId))];
      const found = await this.rows.rowsOf(kind, ids);
      for (const id of ids)
        records.push({ kind, id, row: found.get(id)?.row ?? null, children: found.get(id)?.children });
    }
    for (const l of locks)
      if (!isSignedRecordKind(l.recordType)) records.push({ kind: l.recordType, id: l.recordId, row: null });
    return signedContent(live, records);
  }

  /**
   * Checks the signature against the record recomputed from the live rows: that alone decides.
   * The kept copy is only used to name what differs, and is itself checked against the signature.
   */
  async verify(approval: ApprovalRow): Promise<Verification> {
    const base = { keyId: approval.signingKeyId, differences: [] as RecordDifference[], moreDifferences: 0 };
    if (!approval.signature || !approval.signingKeyId) {
      return {
        ...base,
        status: 'unsigned',
        valid: false,
        unchanged: null,
        signedCopyIntact: null,
        message:
          'This approval was signed before signatures were kept: it has a record hash but no signature that can be checked.',
      };
    }
    if (approval.signingKeyId !== this.key.keyId) {
      return {
        ...base,
        status: 'unknown-key',
        valid: false,
        unchanged: null,
        signedCopyIntact: null,
        message: `This approval was signed with a key this server does not hold (key id ${approval.signingKeyId}), so its signature cannot be checked here.`,
      };
    }
    const live = await this.liveContent(approval);
    if (this.key.verify(live, approval.signature)) {
      return {
        ...base,
        status: 'valid',
        valid: true,
        unchanged: true,
        signedCopyIntact: true,
        message: 'The signature is valid and the record is unchanged since it was signed.',
      };
    }
    const copyIntact = !!approval.signedContent && this.key.verify(approval.signedContent, approval.signature);
    // A copy signed before a migration changed the shape of its rows is carried through the same
    // steps; matching the live record then means nothing in it has changed since it was signed.
    const expected = copyIntact ? upgradeSignedContent(approval.signedContent!) : approval.signedContent;
    if (copyIntact && expected === live) {
      return {
        ...base,
        status: 'valid',
        valid: true,
        unchanged: true,
        signedCopyIntact: true,
        message:
          'The signature is valid and the record is unchanged since it was signed. It was signed in an earlier layout of the records (before a database upgrade added columns at their defaults and renamed units); carried through those steps, the signed record equals the record as it is now.',
      };
    }
    const all = expected ? recordDifferences(expected, live) : [];
    const message = copyIntact
      ? `The record has changed since it was signed: ${all.length} difference${all.length === 1 ? '' : 's'} from the signed record.`
      : all.length
        ? 'The record has changed since it was signed, and the kept copy of the signed record no longer matches its signature either: the differences below are against that altered copy and may not be all that changed.'
        : 'The record has changed since it was signed, and the kept copy of the signed record was altered too, so what changed cannot be named.';
    return {
      ...base,
      status: 'changed',
      valid: false,
      unchanged: false,
      signedCopyIntact: copyIntact,
      message,
      differences: all.slice(0, MAX_DIFFERENCES),
      moreDifferences: Math.max(0, all.length - MAX_DIFFERENCES),
    };
  }

  /** The signed record as anyone can check it offline: the exact text, recomputed now, with its signature and key. */
  async publicRecord(approval: ApprovalRow) {
    const live = await this.liveContent(approval);
    // A record signed in an earlier layout is given as it was signed, so its signature checks out
    // offline; `currentContent` is the same record in today's layout.
    const asSigned =
      approval.signature &&
      approval.signedContent &&
      !this.key.verify(live, approval.signature) &&
      this.key.verify(approval.signedContent, approval.signature) &&
      upgradeSignedContent(approval.signedContent) === live;
    return {
      algorithm: SIGNING_ALGORITHM,
      keyId: approval.signingKeyId,
      publicKey: this.key.publicKeyPem,
      content: asSigned ? approval.signedContent : live,
      ...(asSigned ? { currentContent: live } : {}),
      signature: approval.signature,
    };
  }

  get publicKeyPem(): string {
    return this.key.publicKeyPem;
  }

  get keyId(): string {
    return this.key.keyId;
  }
}
