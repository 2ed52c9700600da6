/**
 * The one list of what the product records and checks. Every place that names a kind of record
 * (audit history, approval locks, evidence, signing, the history filter) or a kind of check (the
 * readiness board, its order and labels, the certificate, waivers) takes it from here, so a typo
 * is a type error instead of a lock silently skipped. The database holds the same lists as CHECK
 * constraints (schema/records.ts, evidence.ts, approvals.ts); `kinds-in-database.e2e-spec.ts`
 * compares them with these lists so they cannot drift apart.
 *
 * A new kind is one entry here: signing finds a signed record's table by the name given here,
 * `npm run db:generate` writes the new constraint, and the browser reads its words from this same
 * file (frontend/src/lib/record-kinds.ts imports it, so it imports nothing itself). See
 * DEVELOPERS.md, "Adding a check type".
 */

/** What one kind of record is: its plain name and what the rest of the product does with it. */
type RecordTypeSpec = {
  /** Plain words in history ("Travel trial"); also the change log's name for its table. */
  label: string;
  /** The record's own name on the verification page, when not its evidence name or label. */
  name?: string;
  /** Evidence can be attached to it; the name shown beside the file ("Repeat-and-reverse run"). */
  evidence?: string;
  /** A change to it can move a machine's readiness (the summary is recounted). */
  readiness: boolean;
  /** Offered in the history filter: of a machine (and the workshop), of the workshop only, or not at all. */
  history: 'machine' | 'workshop' | null;
} &
  /** An approval can stand on it: it is locked, and its row in `table` is signed (approvals/signing/). */
  ({ signed: true; table: string } | { signed: false; table?: string });

/** Every record type the services audit, lock and attach evidence to; the order is the history filter's. */
export const RECORD_TYPES = {
  machine: {
    table: 'machines',
    label: 'Machine',
    name: 'Machine specification',
    signed: true,
    evidence: 'Machine',
    readiness: true,
    history: 'machine',
  },
  rail: { table: 'rails', label: 'Rail', signed: true, evidence: 'Rail', readiness: true, history: 'machine' },
  'rail-sweep': {
    table: 'rail_sweeps',
    label: 'Rail sweep',
    signed: true,
    evidence: 'Rail sweep',
    readiness: true,
    history: 'machine',
  },
  'bolt-down': {
    table: 'bolt_downs',
    label: 'Bolt-down',
    signed: true,
    evidence: 'Bolt-down',
    readiness: false,
    history: 'machine',
  },
  axis: { table: 'axes', label: 'Axis', signed: true, evidence: 'Axis', readiness: true, history: 'machine' },
  'travel-trial': {
    table: 'travel_trials',
    label: 'Travel trial',
    signed: true,
    evidence: 'Travel trial',
    readiness: true,
    history: 'machine',
  },
  'positioning-run': {
    table: 'positioning_runs',
    label: 'Positioning run',
    signed: true,
    evidence: 'Repeat-and-reverse run',
    readiness: true,
    history: 'machine',
  },
  'backlash-check': {
    table: 'backlash_checks',
    label: 'Backlash check',
    signed: true,
    evidence: 'Backlash check',
    readiness: true,
    history: 'machine',
  },
  'diagonal-check': {
    table: 'diagonal_checks',
    label: 'Squareness check',
    signed: true,
    evidence: 'Diagonal check',
    readiness: true,
    history: 'machine',
  },
  'bed-grid': {
    table: 'bed_grids',
    label: 'Bed flatness',
    signed: true,
    evidence: 'Bed grid',
    readiness: true,
    history: 'machine',
  },
  'test-cut': {
    table: 'test_cuts',
    label: 'Test cut',
    signed: true,
    evidence: 'Test cut',
    readiness: true,
    history: 'machine',
  },
  'safety-walk': { table: 'safety_walks', label: 'Safety walk', signed: true, readiness: true, history: 'machine' },
  waiver: { table: 'waivers', label: 'Waiver', signed: true, readiness: true, history: 'machine' },
  approval: { table: 'approvals', label: 'Approval', signed: false, readiness: false, history: 'machine' },
  'approval-request': {
    table: 'approval_requests',
    label: 'Approval request',
    signed: false,
    readiness: true,
    history: null,
  },
  evidence: { table: 'evidence', label: 'Photo or file', signed: false, readiness: false, history: 'machine' },
  'hole-pattern': { table: 'hole_patterns', label: 'Hole pattern', signed: false, readiness: true, history: 'machine' },
  'safety-item': {
    table: 'safety_items',
    label: 'Safety-walk item',
    signed: false,
    evidence: 'Safety walk item',
    readiness: true,
    history: 'workshop',
  },
  'target-set': { table: 'target_sets', label: 'Target set', signed: false, readiness: true, history: 'workshop' },
  person: { table: 'users', label: 'Person', signed: false, readiness: false, history: 'workshop' },
  'sign-in': { label: 'Sign-in', signed: false, readiness: false, history: 'workshop' },
  password: { label: 'Password', signed: false, readiness: false, history: 'workshop' },
} as const satisfies Record<string, RecordTypeSpec>;

export type RecordType = keyof typeof RECORD_TYPES;
export const RECORD_TYPE_NAMES = Object.keys(RECORD_TYPES) as RecordType[];

type Spec<K extends RecordType> = (typeof RECORD_TYPES)[K];
/** The record types an approval stands on: locked, signed, refused while approved. */
export type SignedRecordType = { [K in RecordType]: Spec<K>['signed'] extends true ? K : never }[RecordType];
/** The record types evidence can be attached to (the subjects registry's types). */
export type EvidenceSubjectType = { [K in RecordType]: Spec<K> extends { evidence: string } ? K : never }[RecordType];

export const SIGNED_RECORD_TYPES = RECORD_TYPE_NAMES.filter((k) => RECORD_TYPES[k].signed) as SignedRecordType[];
export const EVIDENCE_SUBJECT_TYPES = RECORD_TYPE_NAMES.filter(
  (k) => 'evidence' in RECORD_TYPES[k],
) as EvidenceSubjectType[];

export const isRecordType = (value: string): value is RecordType => Object.hasOwn(RECORD_TYPES, value);
export const isSignedRecordType = (value: string): value is SignedRecordType =>
  isRecordType(value) && RECORD_TYPES[value].signed;
export const isEvidenceSubjectType = (value: string): value is EvidenceSubjectType =>
  isRecordType(value) && 'evidence' in RECORD_TYPES[value];

/** How a check's result is read against its target: at most, at least, or within ± the target. */
export type TargetSense = 'at-most' | 'at-least' | 'plus-minus' | 'all-passed';

interface CheckKindSpec {
  /** Plain words on the board, the certificate and in messages. */
  label: string;
  /** The record a result of this kind is kept in (what a waiver and an approval lock). */
  recordType: SignedRecordType;
  sense: TargetSense;
  /** Drawn as a gauge on the certificate when it has a result but no series. */
  gauge: boolean;
}

/** Every required check of the readiness board, in the board's order. */
export const CHECK_KINDS = {
  'rail-straightness': { label: 'Rail straightness', recordType: 'rail-sweep', sense: 'at-most', gauge: true },
  'rail-parallelism': { label: 'Rail parallelism', recordType: 'rail-sweep', sense: 'at-most', gauge: true },
  'travel-trial': { label: 'Travel trial', recordType: 'travel-trial', sense: 'at-most', gauge: false },
  backlash: { label: 'Backlash check', recordType: 'backlash-check', sense: 'at-most', gauge: true },
  positioning: { label: 'Repeat-and-reverse run', recordType: 'positioning-run', sense: 'at-most', gauge: true },
  'speed-check': { label: 'Speed check', recordType: 'axis', sense: 'at-least', gauge: false },
  'travel-envelope': { label: 'Travel envelope', recordType: 'axis', sense: 'at-least', gauge: false },
  'diagonal-check': { label: 'Diagonal check', recordType: 'diagonal-check', sense: 'at-most', gauge: true },
  'bed-grid': { label: 'Bed grid', recordType: 'bed-grid', sense: 'at-most', gauge: true },
  'test-cut': { label: 'Test cut', recordType: 'test-cut', sense: 'plus-minus', gauge: false },
  'safety-walk': { label: 'Safety walk', recordType: 'safety-walk', sense: 'all-passed', gauge: false },
} as const satisfies Record<string, CheckKindSpec>;

export type CheckKind = keyof typeof CHECK_KINDS;
/** The board's order. */
export const CHECK_KIND_NAMES = Object.keys(CHECK_KINDS) as CheckKind[];

export const isCheckKind = (value: string): value is CheckKind => Object.hasOwn(CHECK_KINDS, value);

/** The record type's plain name; a type no longer known (older history) in words made from it. */
export const recordTypeLabel = (recordType: string): string =>
  isRecordType(recordType)
    ? RECORD_TYPES[recordType].label
    : recordType.replace(/-/g, ' ').replace(/^./, (c) => c.toUpperCase());
