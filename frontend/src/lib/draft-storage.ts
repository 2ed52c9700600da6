/**
 * Drafts typed at the machine are kept in this browser, but not on every keystroke: a write to
 * localStorage is synchronous and, with a long sweep, costs more than the keystroke itself on a
 * slow tablet. Writes for a key are gathered and made at most once per `DRAFT_SAVE_MS`; anything
 * still waiting is written when the page is hidden or left, so a closed tab loses nothing.
 */
export const DRAFT_SAVE_MS = 400;

const waiting = new Map<string, string | null>();
let timer: ReturnType<typeof setTimeout> | null = null;

function writeNow(key: string, text: string | null) {
  try {
    if (text === null) localStorage.removeItem(key);
    else localStorage.setItem(key, text);
  } catch {
    // Storage blocked or full: the draft still lives in the page for this visit.
  }
}

/** Writes every waiting draft now. */
export function flushDrafts(): void {
  if (timer) clearTimeout(timer);
  timer = null;
  for (const [key, text] of waiting) writeNow(key, text);
  waiting.clear();
}

/** Keeps `text` under `key` (null removes it) within DRAFT_SAVE_MS. */
export function saveDraftSoon(key: string, text: string | null): void {
  waiting.set(key, text);
  timer ??= setTimeout(flushDrafts, DRAFT_SAVE_MS);
}

/** The saved draft, or the one still waiting to be written. */
export function readDraft(key: string): string | null {
  if (waiting.has(key)) return waiting.get(key)!;
  try {
    return localStorage.getItem(key);
  } catch {
    return null;
  }
}

if (typeof window !== 'undefined') {
  window.addEventListener('pagehide', flushDrafts);
  document.addEventListener('visibilitychange', () => document.visibilityState === 'hidden' && flushDrafts());
}
