/**
 * The server's kinds of record and of check (backend/src/records/kinds.ts) as the screens name
 * them: the readiness board, the history filter, evidence and the verification page all read
 * their words from here. The server's spec `records/kinds-front.spec.ts` compares this file with
 * its registry, so a kind added there and not here fails the tests.
 */

/** How a target reads: at most, at least, within ± the target, or every item passed. */
export type TargetSense = 'at-most' | 'at-least' | 'plus-minus' | 'all-passed';

/** Every required check of the readiness board, in the board's order. */
export const CHECK_KINDS = {
  'rail-straightness': { label: 'Rail straightness', sense: 'at-most' },
  'rail-parallelism': { label: 'Rail parallelism', sense: 'at-most' },
  'travel-trial': { label: 'Travel trial', sense: 'at-most' },
  backlash: { label: 'Backlash check', sense: 'at-most' },
  positioning: { label: 'Repeat-and-reverse run', sense: 'at-most' },
  'speed-check': { label: 'Speed check', sense: 'at-least' },
  'travel-envelope': { label: 'Travel envelope', sense: 'at-least' },
  'diagonal-check': { label: 'Diagonal check', sense: 'at-most' },
  'bed-grid': { label: 'Bed grid', sense: 'at-most' },
  'test-cut': { label: 'Test cut', sense: 'plus-minus' },
  'safety-walk': { label: 'Safety walk', sense: 'all-passed' },
} as const satisfies Record<string, { label: string; sense: TargetSense }>;

export type CheckKind = keyof typeof CHECK_KINDS;

export const CHECK_KIND_LABELS = Object.fromEntries(
  Object.entries(CHECK_KINDS).map(([k, v]) => [k, v.label]),
) as Record<CheckKind, string>;

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

/** Every record type the server audits, locks and attaches evidence to; the order is the history filter's. */
export const RECORD_TYPES = {
  machine: { label: 'Machine', name: 'Machine specification', evidence: 'Machine', history: 'machine' },
  rail: { label: 'Rail', evidence: 'Rail', history: 'machine' },
  'rail-sweep': { label: 'Rail sweep', evidence: 'Rail sweep', history: 'machine' },
  'bolt-down': { label: 'Bolt-down', evidence: 'Bolt-down', history: 'machine' },
  axis: { label: 'Axis', evidence: 'Axis', history: 'machine' },
  'travel-trial': { label: 'Travel trial', evidence: 'Travel trial', history: 'machine' },
  'positioning-run': { label: 'Positioning run', evidence: 'Repeat-and-reverse run', history: 'machine' },
  'backlash-check': { label: 'Backlash check', evidence: 'Backlash check', history: 'machine' },
  'diagonal-check': { label: 'Squareness check', evidence: 'Diagonal check', history: 'machine' },
  'bed-grid': { label: 'Bed flatness', evidence: 'Bed grid', history: 'machine' },
  'test-cut': { label: 'Test cut', evidence: 'Test cut', history: 'machine' },
  'safety-walk': { label: 'Safety walk', history: 'machine' },
  waiver: { label: 'Waiver', history: 'machine' },
  approval: { label: 'Approval', history: 'machine' },
  'approval-request': { label: 'Approval request', history: null },
  evidence: { label: 'Photo or file', history: 'machine' },
  'hole-pattern': { label: 'Hole pattern', history: 'machine' },
  'safety-item': { label: 'Safety-walk item', evidence: 'Safety walk item', history: 'workshop' },
  'target-set': { label: 'Target set', history: 'workshop' },
  person: { label: 'Person', history: 'workshop' },
  'sign-in': { label: 'Sign-in', history: 'workshop' },
  password: { label: 'Password', history: 'workshop' },
} as const satisfies Record<string, RecordTypeWords>;

export type RecordType = keyof typeof RECORD_TYPES;

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
