import type { HoleWriteBody } from '../api/record-hole';
import type { BoltDown, BoltDownHole, BoltDownMode } from '../types';

/** An entry of this device not yet recorded: its path and body. */
export interface WaitingWrite {
  path: string;
  body?: unknown;
}

export interface GuideHole extends BoltDownHole {
  /** A write for this hole is kept on this device, waiting to be sent. */
  waiting: boolean;
}

export interface GuideState {
  holes: GuideHole[];
  /** Holes in the proposed fixing order. */
  inOrder: GuideHole[];
  nextHole: number | null;
  fixedCount: number;
  complete: boolean;
  waitingCount: number;
}

/**
 * The guide as the builder sees it: the server's state, with the writes still waiting on this
 * device laid over it in the order they were made. While writes wait, the aims are worked out
 * here with the same rule the server uses (face: the first fixed reading; line: the straight
 * line between the nearest fixed holes either side, or the nearest one beyond the ends), so work
 * can go on without a connection; once the writes are sent the server's values replace these.
 */
export function guideState(bd: BoltDown, waiting: readonly WaitingWrite[]): GuideState {
  const own = waiting.filter((w) => w.path.startsWith(`/bolt-downs/${bd.id}/holes/`));
  if (!own.length)
    return finish(
      bd.holes.map((h) => ({ ...h, waiting: false })),
      bd.nextHole,
      bd.fixedCount,
      bd.complete,
      0,
    );

  // Fix sequence as the server recorded it, then the waiting fixes in the order they were made.
  const sequence = bd.holes
    .filter((h) => h.fixed)
    .sort((a, b) => Date.parse(a.fixedAt!) - Date.parse(b.fixedAt!) || a.order - b.order)
    .map((h) => h.index);
  const holes: GuideHole[] = bd.holes.map((h) => ({ ...h, waiting: false }));
  for (const w of own) {
    const index = Number(w.path.split('/').pop());
    const body = w.body as HoleWriteBody;
    const h = holes[index];
    if (!h) continue;
    h.waiting = true;
    h.reading = body.reading;
    if (body.fixed && !h.fixed) sequence.push(index);
    if (!body.fixed && sequence.includes(index)) sequence.splice(sequence.indexOf(index), 1);
    h.fixed = body.fixed;
    if (!body.fixed) h.fixedAt = h.fixedBy = null;
  }
  const seqOf = new Map(sequence.map((index, k) => [index, k]));
  for (const h of holes) {
    const before = h.fixed ? sequence.slice(0, seqOf.get(h.index)) : sequence;
    h.target = aim(
      bd.mode,
      h.position,
      before.map((i) => ({ position: holes[i].position, reading: holes[i].reading! })),
    );
    h.difference = h.reading !== null && h.target !== null ? h.reading - h.target : null;
    h.onTarget = h.difference === null ? null : Math.abs(h.difference) <= bd.band + 1e-9;
  }
  const next = [...holes].sort((a, b) => a.order - b.order).find((h) => !h.fixed)?.index ?? null;
  return finish(holes, next, sequence.length, holes.length > 0 && next === null, own.length);
}

function finish(
  holes: GuideHole[],
  nextHole: number | null,
  fixedCount: number,
  complete: boolean,
  waitingCount: number,
): GuideState {
  return { holes, inOrder: [...holes].sort((a, b) => a.order - b.order), nextHole, fixedCount, complete, waitingCount };
}

function aim(mode: BoltDownMode, position: number, fixed: { position: number; reading: number }[]): number | null {
  if (!fixed.length) return null;
  if (mode === 'face') return fixed[0].reading;
  let left: (typeof fixed)[number] | null = null;
  let right: (typeof fixed)[number] | null = null;
  for (const h of fixed) {
    if (h.position === position) return h.reading;
    if (h.position < position && (!left || h.position > left.position)) left = h;
    if (h.position > position && (!right || h.position < right.position)) right = h;
  }
  if (left && right)
    return (
      left.reading + ((position - left.position) / (right.position - left.position)) * (right.reading - left.reading)
    );
  return (left ?? right)!.reading;
}
