import type { Evidence } from '../types';
import { formatBytes } from './format-bytes';
import { formatDate } from '../../../lib/format-time';

/** Said of evidence attached while an approval stood. */
export const AFTER_APPROVAL = 'Added after approval: not part of what was signed';

/** "Bo Builder · 01/12/2026 · 2.4 MB": who attached it, when, how big (and whether it came after the approval). */
export function evidenceMeta(item: Evidence): string {
  const base = `${item.uploadedBy.name} · ${formatDate(item.uploadedAt)} · ${formatBytes(item.size)}`;
  return item.addedAfterApproval ? `${base} · ${AFTER_APPROVAL}` : base;
}
