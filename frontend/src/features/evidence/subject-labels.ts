import { evidenceSubjectLabel } from '../../lib/record-kinds';

/** Plain names of the record types evidence can be attached to (lib/record-kinds.ts). */
export const subjectTypeLabel = (type: string) => evidenceSubjectLabel(type);
