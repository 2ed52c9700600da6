import { readDraft, saveDraftSoon } from '../../../lib/draft-storage';

/**
 * What is typed at a hole before it is fixed, kept in this browser so a reload, a dropped tab or
 * a dead tablet battery does not lose it (written a few times a second at most, and when the page
 * is hidden).
 */
const key = (boltDownId: string, index: number) => `railwright.bolt-down-draft.${boltDownId}.${index}`;

export function loadDraft(boltDownId: string, index: number): string {
  return readDraft(key(boltDownId, index)) ?? '';
}

export function saveDraft(boltDownId: string, index: number, text: string): void {
  saveDraftSoon(key(boltDownId, index), text || null);
}
