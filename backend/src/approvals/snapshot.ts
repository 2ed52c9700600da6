import type { CheckSeries, ReadinessCheck } from '../records/readiness.js';
import type { TargetValue } from '../database/schema/target-sets.js';
import type { ResultWarning } from '../engine/warnings.js';
import { canonicalJson, sha256Hex } from './canonical-json.js';

export interface WaiverInfo {
  id: string;
  reason: string;
  by: string;
  at: string;
}

/** One check as the board shows it and as an approval keeps it. */
export interface BoardCheck {
  key: string;
  kind: ReadinessCheck['kind'];
  subject: string;
  status: 'not-started' | 'within-target' | 'outside-target' | 'waived';
  /** What the contributor reported before any waiver. */
  measuredStatus: ReadinessCheck['status'];
  target: (TargetValue & { label?: string }) | null;
  result: ReadinessCheck['result'];
  recordType: ReadinessCheck['recordType'];
  recordId: string | null;
  recordedAt: string | null;
  /** Where the check's record is shown (snapshots taken before it was kept name a screen path, `link`, instead). */
  place: ReadinessCheck['place'];
  waiver: WaiverInfo | null;
  /** What a person should know about the result; absent in snapshots taken before warnings were kept. */
  warnings?: ResultWarning[];
  series?: CheckSeries;
}

/** Everything the certificate is made from: never read from live data after approval. */
export interface ApprovalSnapshot {
  version: 1;
  workshop: { id: string; name: string };
  machine: { id: string; name: string; kind: string; workArea: { x: number; y: number } };
  targetSet: { id: string; name: string; recheckIntervalDays: number };
  checks: BoardCheck[];
}

/** The SHA-256 over the canonical JSON of the snapshot: the record hash printed and shown. */
export function snapshotHash(snapshot: ApprovalSnapshot): string {
  return sha256Hex(canonicalJson(snapshot));
}
