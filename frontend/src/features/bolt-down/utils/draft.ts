/**
 * What is typed at a hole before it is fixed, kept in this browser so a reload, a dropped tab or
 * a dead tablet battery does not lose it.
 */
const key = (boltDownId: string, index: number) => `railwright.bolt-down-draft.${boltDownId}.${index}`;

export function loadDraft(boltDownId: string, index: number): string {
  try {
    return localStorage.getItem(key(boltDownId, index)) ?? '';
  } catch {
    return '';
  }
}

export function saveDraft(boltDownId: string, index: number, text: string): void {
  try {
    if (text) localStorage.setItem(key(boltDownId, index), text);
    else localStorage.removeItem(key(boltDownId, index));
  } catch {
    // Storage blocked or full: the text stays in the field for this visit.
  }
}
