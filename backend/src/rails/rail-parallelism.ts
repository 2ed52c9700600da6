import { evaluateParallelism } from '../engine/parallelism.js';
import type { SweepRow } from './rails.repository.js';
import { finiteList } from '../common/stored-result.js';

/** What the comparison reads of a sweep (full rows fit too). */
export type ComparedSweep = Pick<SweepRow, 'id' | 'datum' | 'takenAt' | 'positionsMm' | 'readingsMm'> & {
  face?: SweepRow['face'] | null;
};

// Two stations are the same place when they agree to a micrometre (positions are typed in mm).
const SAME_POSITION_MM = 0.001;

export type PairOutcome<S extends ComparedSweep = ComparedSweep> =
  | {
      comparable: true;
      a: S;
      b: S;
      datum: string;
      positionsMm: number[];
      parallelismMm: number;
      meanOffsetMm: number;
      differencesMm: number[];
    }
  | { comparable: false; reason: string; a: S | null; b: S | null; unreadable?: true };

const datumKey = (d: string | null) => (d ?? '').trim().toLowerCase();

/**
 * Parallelism of two partner rails from their latest sweeps taken against the same datum
 * (sweeps newest first). Differences are B − A at each station; their mean is the height
 * (offset) of B over A. The stations must be the same positions on both rails.
 */
export function partnerParallelism<S extends ComparedSweep>(
  sweepsA: S[],
  sweepsB: S[],
  labels: { a: string; b: string },
): PairOutcome<S> {
  if (!sweepsA.length || !sweepsB.length) {
    const missing = [!sweepsA.length ? labels.a : null, !sweepsB.length ? labels.b : null]
      .filter(Boolean)
      .join(' and ');
    return {
      comparable: false,
      reason: `No sweep of rail ${missing} yet`,
      a: sweepsA[0] ?? null,
      b: sweepsB[0] ?? null,
    };
  }
  const latestByDatum = (sweeps: S[]) => {
    const out = new Map<string, S>();
    for (const s of sweeps) if (datumKey(s.datum) && !out.has(datumKey(s.datum))) out.set(datumKey(s.datum), s);
    return out;
  };
  const byA = latestByDatum(sweepsA);
  const byB = latestByDatum(sweepsB);
  let best: { a: S; b: S } | null = null;
  for (const [key, a] of byA) {
    const b = byB.get(key);
    if (!b) continue;
    const when = Math.max(a.takenAt.getTime(), b.takenAt.getTime());
    if (!best || when > Math.max(best.a.takenAt.getTime(), best.b.takenAt.getTime())) best = { a, b };
  }
  if (!best) {
    return {
      comparable: false,
      reason: `No sweeps of rails ${labels.a} and ${labels.b} name the same datum; sweep both against one common datum and give it the same name`,
      a: sweepsA[0],
      b: sweepsB[0],
    };
  }
  const { a, b } = best;
  // An old stored sweep with a reading or position that is not a number cannot be compared; say which.
  const bad = [
    [a, labels.a],
    [b, labels.b],
  ]
    .filter(
      ([s]) =>
        !finiteList((s as S).positionsMm) ||
        !finiteList((s as S).readingsMm) ||
        (s as S).positionsMm.length !== (s as S).readingsMm.length,
    )
    .map(([, l]) => l as string);
  if (bad.length) {
    return {
      comparable: false,
      unreadable: true,
      reason: `The stored readings of the latest sweep of rail ${bad.join(' and rail ')} against datum ${a.datum!.trim()} cannot be read; sweep again and delete that sweep`,
      a,
      b,
    };
  }
  const order = a.positionsMm.map((p, i) => ({ p, i })).sort((x, y) => x.p - y.p);
  const bOrder = b.positionsMm.map((p, i) => ({ p, i })).sort((x, y) => x.p - y.p);
  const same = order.length === bOrder.length && order.every((x, k) => Math.abs(x.p - bOrder[k].p) <= SAME_POSITION_MM);
  if (!same) {
    return {
      comparable: false,
      reason: `The stations differ: rail ${labels.a} was read at ${order.length} stations and rail ${labels.b} at ${bOrder.length}${order.length === bOrder.length ? ', at other positions' : ''}; read both rails at the same positions`,
      a,
      b,
    };
  }
  const positionsMm = order.map((x) => x.p);
  const result = evaluateParallelism({
    positionsMm,
    railAMm: order.map((x) => a.readingsMm[x.i]),
    railBMm: bOrder.map((x) => b.readingsMm[x.i]),
  });
  return {
    comparable: true,
    a,
    b,
    datum: a.datum!.trim(),
    positionsMm,
    parallelismMm: result.parallelismMm,
    meanOffsetMm: result.meanOffsetMm,
    differencesMm: result.differencesMm,
  };
}
