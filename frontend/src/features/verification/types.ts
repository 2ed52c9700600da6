import { RECORD_TYPES, recordName } from '../../lib/record-kinds';
export type VerificationStatus = 'valid' | 'changed' | 'unsigned' | 'unknown-key';

export interface RecordDifference {
  /** Where in the signed record, e.g. records["rail-sweep:…"].row.readingsRaw[2]. */
  path: string;
  record: { kind: string; id: string } | null;
  change: 'changed' | 'added' | 'removed';
  signed: unknown;
  current: unknown;
}

/** GET /api/public/verify/:token — the approval printed on a certificate and whether it can be trusted. */
export interface PublicVerification {
  approvalId: string;
  status: VerificationStatus;
  valid: boolean;
  unchanged: boolean | null;
  message: string;
  signedBy: string;
  signedAt: string;
  algorithm: 'Ed25519';
  keyId: string | null;
  signedCopyIntact: boolean | null;
  differences: RecordDifference[];
  moreDifferences: number;
  recordHash: string;
  stands: boolean;
  reopened: { at: string; by: string | null; reason: string | null } | null;
  machine: { name: string; kind: string };
  workshop: string;
  statement: string;
  recheckDueAt: string;
  recheckIntervalDays: number;
  /** The approval stands and its re-check date has passed. */
  recheckDue: boolean;
  targetSet: string;
  checkCount: number;
  waivedCount: number;
}

export const verificationKeys = {
  all: ['verification'] as const,
  byToken: (token: string) => [...verificationKeys.all, token] as const,
};

/** Plain names for the kinds of record an approval stands on (lib/record-kinds.ts). */
export const RECORD_KIND_LABELS: Record<string, string> = Object.fromEntries(Object.keys(RECORD_TYPES).map((k) => [k, recordName(k)]));

export { formatDateTime as dateTime, formatDate as dateOnly } from '../../lib/format-time';
