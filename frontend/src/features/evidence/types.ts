import type { AnswerOf, Schemas } from '../../lib/api/schemas';

/** `size` in bytes; `addedAfterApproval`: attached while an approval stood, not part of what was signed. */
export type Evidence = Schemas['EvidenceResponse'];
export type EvidenceKind = Evidence['kind'];
export type EvidenceLimits = AnswerOf<'/api/evidence/limits', 'get'>;

export interface EvidenceSubject {
  subjectType: string;
  subjectId: string;
}

/** One key factory for the feature; uploads and deletes invalidate everything under `all`. */
export const evidenceKeys = {
  all: ['evidence'] as const,
  subject: (subjectType: string, subjectId: string) =>
    [...evidenceKeys.all, 'subject', subjectType, subjectId] as const,
  machine: (machineId: string) => [...evidenceKeys.all, 'machine', machineId] as const,
  limits: () => [...evidenceKeys.all, 'limits'] as const,
};

/** What the file input offers; the server decides from the bytes in the end. */
export const ACCEPT_ATTRIBUTE =
  'image/jpeg,image/png,image/webp,application/pdf,text/csv,.csv,.jpg,.jpeg,.png,.webp,.pdf';
