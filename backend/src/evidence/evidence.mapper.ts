import type { EvidenceKind } from '../database/schema/evidence.js';
import type { EvidenceRow } from './evidence.repository.js';

export interface EvidenceResponse {
  id: string;
  machineId: string;
  subject: { type: string; id: string; label: string };
  kind: EvidenceKind;
  fileName: string;
  caption: string;
  contentType: string;
  /** Size of the file, in bytes. */
  size: number;
  sha256: string;
  widthPx: number | null;
  heightPx: number | null;
  contentUrl: string;
  /** Photos only. */
  thumbnailUrl: string | null;
  uploadedBy: { id: string | null; name: string };
  uploadedAt: string;
  /** The subject is part of an approval: the evidence is kept. */
  locked: boolean;
  /** Whether the person asking may delete it now. */
  canDelete: boolean;
  /** Attached while an approval stood: not part of what was signed. */
  addedAfterApproval: boolean;
}

export function toEvidenceResponse(
  row: EvidenceRow,
  extra: { subjectLabel?: string; locked: boolean; canDelete: boolean },
): EvidenceResponse {
  return {
    id: row.id,
    machineId: row.machineId,
    subject: { type: row.subjectType, id: row.subjectId, label: extra.subjectLabel ?? row.subjectLabel },
    kind: row.kind,
    fileName: row.fileName,
    caption: row.caption,
    contentType: row.contentType,
    size: row.sizeBytes,
    sha256: row.sha256,
    widthPx: row.widthPx,
    heightPx: row.heightPx,
    contentUrl: `/api/evidence/${row.id}/content`,
    thumbnailUrl: row.thumbnailKey ? `/api/evidence/${row.id}/thumbnail` : null,
    uploadedBy: { id: row.uploadedById, name: row.uploadedByName },
    uploadedAt: row.createdAt.toISOString(),
    locked: extra.locked,
    canDelete: extra.canDelete,
    addedAfterApproval: row.addedAfterApproval,
  };
}
