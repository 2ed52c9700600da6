export type EvidenceKind = 'photo' | 'file';

export interface Evidence {
  id: string;
  machineId: string;
  subject: { type: string; id: string; label: string };
  kind: EvidenceKind;
  fileName: string;
  caption: string;
  contentType: string;
  /** Bytes. */
  size: number;
  sha256: string;
  widthPx: number | null;
  heightPx: number | null;
  contentUrl: string;
  thumbnailUrl: string | null;
  uploadedBy: { id: string | null; name: string };
  uploadedAt: string;
  locked: boolean;
  canDelete: boolean;
  /** Attached while an approval stood: not part of what was signed. */
  addedAfterApproval: boolean;
}

export interface EvidenceLimits {
  maxBytes: number;
  accepted: { contentType: string; label: string; kind: EvidenceKind; extensions: string[] }[];
}

export interface EvidenceSubject {
  subjectType: string;
  subjectId: string;
}

/** One key factory for the feature; uploads and deletes invalidate everything under `all`. */
export const evidenceKeys = {
  all: ['evidence'] as const,
  subject: (subjectType: string, subjectId: string) => [...evidenceKeys.all, 'subject', subjectType, subjectId] as const,
  machine: (machineId: string) => [...evidenceKeys.all, 'machine', machineId] as const,
  limits: () => [...evidenceKeys.all, 'limits'] as const,
};

/** What the file input offers; the server decides from the bytes in the end. */
export const ACCEPT_ATTRIBUTE = 'image/jpeg,image/png,image/webp,application/pdf,text/csv,.csv,.jpg,.jpeg,.png,.webp,.pdf';
