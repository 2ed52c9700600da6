/**
 * Tells an indicator's typed reading from a person's typing. An indicator in keyboard mode sends its
 * reading as keys a few milliseconds apart and ends it with Enter; nobody keeps up an average under
 * BURST_GAP_MS a key (that is over 200 words a minute).
 *
 * A gap is counted from when the page had finished with the key before (`done`), not from when
 * that key arrived: a busy page or a slow tablet holds keys back while it draws, and the time it
 * spends drawing is not the sender's. Misjudged either way, the cost is small: a person's Enter
 * taken for an indicator's only stops short of fixing a hole.
 */
export const BURST_GAP_MS = 50;
/** A pause this long starts a new run of keys: whatever came before it was typed by a person. */
export const PAUSE_MS = 250;

export class KeyboardBurst {
  private text = '';
  private gapsMs = 0;
  private lastAt = -Infinity;

  /** The page has finished handling the last key (its input drawn) at this time. */
  done(atMs: number) {
    this.lastAt = Math.max(this.lastAt, atMs);
  }

  /** Feeds one keydown; returns the burst's text when this key is the Enter that closes a burst. */
  key(key: string, atMs: number): string | null {
    const gap = Math.max(0, atMs - this.lastAt);
    this.lastAt = atMs;
    if (key === 'Enter') {
      const { text } = this;
      const mean = (this.gapsMs + gap) / text.length;
      this.text = '';
      return text && gap < PAUSE_MS && mean < BURST_GAP_MS ? text : null;
    }
    if (key.length === 1) {
      if (gap >= PAUSE_MS || !this.text) {
        this.text = key;
        this.gapsMs = 0;
      } else {
        this.text += key;
        this.gapsMs += gap;
      }
    } else if (key !== 'Shift') this.text = ''; // Backspace, arrows, Tab: a person is at the keys.
    return null;
  }
}
