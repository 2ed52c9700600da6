import { fileTypeFromBuffer } from 'file-type';
import type { EvidenceKind } from '../database/schema/evidence.js';

export interface AcceptedType {
  contentType: string;
  kind: EvidenceKind;
  label: string;
  extensions: readonly string[];
}

export const ACCEPTED_TYPES: readonly AcceptedType[] = [
  { contentType: 'image/jpeg', kind: 'photo', label: 'JPEG', extensions: ['.jpg', '.jpeg'] },
  { contentType: 'image/png', kind: 'photo', label: 'PNG', extensions: ['.png'] },
  { contentType: 'image/webp', kind: 'photo', label: 'WebP', extensions: ['.webp'] },
  { contentType: 'application/pdf', kind: 'file', label: 'PDF', extensions: ['.pdf'] },
  { contentType: 'text/csv', kind: 'file', label: 'CSV', extensions: ['.csv'] },
];

export const ACCEPTED_LABELS = ACCEPTED_TYPES.map((t) => t.label).join(', ');

const PROGRAMS = new Set([
  'exe',
  'elf',
  'mach',
  'dll',
  'class',
  'wasm',
  'dex',
  'msi',
  'deb',
  'rpm',
  'apk',
  'cab',
  'lnk',
]);

export interface SniffResult {
  head: Buffer;
  sizeBytes: number;
  /** Every byte was valid UTF-8 and none was NUL: the only way to tell a CSV from anything else. */
  plainText: boolean;
}

export type TypeDecision = { accepted: AcceptedType } | { refused: string };

/** Decides the type from the file's bytes; the name only matters for CSV, which has no signature. */
export async function decideType(fileName: string, sniff: SniffResult): Promise<TypeDecision> {
  const found = await fileTypeFromBuffer(sniff.head);
  if (found) {
    const accepted = ACCEPTED_TYPES.find((t) => t.contentType === found.mime);
    if (accepted) return { accepted };
    const what = PROGRAMS.has(found.ext)
      ? `a program (${found.ext.toUpperCase()})`
      : `a ${found.ext.toUpperCase()} file (${found.mime})`;
    const disguised = !fileName.toLowerCase().endsWith(`.${found.ext}`);
    return {
      refused: `${fileName} is ${what}${disguised ? ', whatever its name says' : ''}. Accepted: ${ACCEPTED_LABELS}.`,
    };
  }
  if (fileName.toLowerCase().endsWith('.csv')) {
    if (sniff.plainText) return { accepted: ACCEPTED_TYPES.find((t) => t.contentType === 'text/csv')! };
    return { refused: `${fileName} is named .csv but is not plain UTF-8 text. Accepted: ${ACCEPTED_LABELS}.` };
  }
  return { refused: `${fileName} is not a type Railwright keeps: its contents are not ${ACCEPTED_LABELS}.` };
}
