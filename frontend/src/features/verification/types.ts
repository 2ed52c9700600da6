import type { AnswerOf, Schemas } from '../../lib/api/schemas';
import { RECORD_TYPES, recordName } from '../../lib/record-kinds';
/** GET /api/public/verify/:token — the approval printed on a certificate and whether it can be trusted. */
export type PublicVerification = AnswerOf<'/api/public/verify/{token}', 'get'>;
export type VerificationStatus = PublicVerification['status'];
/** `path`: where in the signed record, e.g. records["rail-sweep:…"].row.readingsRaw[2]. */
export type RecordDifference = Schemas['RecordDifference'];

export const verificationKeys = {
  all: ['verification'] as const,
  byToken: (token: string) => [...verificationKeys.all, token] as const,
};

/** Plain names for the kinds of record an approval stands on (lib/record-kinds.ts). */
export const RECORD_KIND_LABELS: Record<string, string> = Object.fromEntries(
  Object.keys(RECORD_TYPES).map((k) => [k, recordName(k)]),
);

export { formatDateTime as dateTime, formatDate as dateOnly } from '../../lib/format-time';
