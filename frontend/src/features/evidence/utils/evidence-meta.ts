import type { Evidence } from '../types';
import { formatBytes } from './format-bytes';

/** "Bo Builder · 01/12/2026 · 2.4 MB": who attached it, when, how big. */
export function evidenceMeta(item: Evidence): string {
  return `${item.uploadedBy.name} · ${new Date(item.uploadedAt).toLocaleDateString()} · ${formatBytes(item.size)}`;
}
