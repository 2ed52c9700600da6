/**
 * The server's kinds of record and of check as the screens name them: the readiness board, the
 * history filter, evidence and the verification page all read their words from here. The list
 * itself is the server's own (backend/src/records/kinds.ts, a file that imports nothing), so a
 * kind added there is known here at once, with the same words and order.
 */
import {
  CHECK_KINDS,
  RECORD_TYPES,
  type CheckKind,
  type RecordType,
  type TargetSense,
} from '../../../backend/src/records/kinds';

export { CHECK_KINDS, RECORD_TYPES };
export type { CheckKind, RecordType, TargetSense };

export const CHECK_KIND_LABELS = Object.fromEntries(
  Object.entries(CHECK_KINDS).map(([k, v]) => [k, v.label]),
) as Record<CheckKind, string>;

/** What the screens read of a record type. */
interface RecordTypeWords {
  /** The history's word for it ("Positioning run"). */
  label: string;
  /** The record's own name on the verification page, when not its evidence name or label. */
  name?: string;
  /** Evidence can be attached to it; the name shown beside the file ("Repeat-and-reverse run"). */
  evidence?: string;
  /** Offered in the history filter: of a machine (and the workshop), of the workshop only, or not at all. */
  history: 'machine' | 'workshop' | null;
}

const words = (type: string): RecordTypeWords | undefined => (RECORD_TYPES as Record<string, RecordTypeWords>)[type];

/** The record's own name ("Repeat-and-reverse run"); a type this version does not know in words made from it. */
export const recordName = (type: string): string => {
  const w = words(type);
  return w ? (w.name ?? w.evidence ?? w.label) : type.replace(/-/g, ' ');
};

/** What a file is attached to, in words ("Bed grid"). */
export const evidenceSubjectLabel = (type: string): string => words(type)?.evidence ?? type.replace(/-/g, ' ');

/** [type, label] pairs of the history filter: a machine's, or the workshop's (its own kinds first). */
export function historyKinds(scope: 'machine' | 'workshop'): [string, string][] {
  const all = Object.entries(RECORD_TYPES as Record<string, RecordTypeWords>);
  const pick = (h: 'machine' | 'workshop') =>
    all.filter(([, w]) => w.history === h).map(([k, w]): [string, string] => [k, w.label]);
  return scope === 'machine' ? pick('machine') : [...pick('workshop'), ...pick('machine')];
}
