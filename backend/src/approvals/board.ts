import { CHECK_KIND_NAMES, CHECK_KINDS, type CheckKind } from '../records/kinds.js';
import type { ReadinessCheck } from '../records/readiness.js';
import type { WaiverRow } from './approvals.repository.js';
import type { BoardCheck } from './snapshot.js';

/** The board's order of kinds is the registry's (records/kinds.ts). */
const KIND_ORDER: readonly CheckKind[] = CHECK_KIND_NAMES;

/** The newest waiver of the check that belongs to its current record (or to "never started"). */
export function waiverFor(check: ReadinessCheck, waivers: WaiverRow[]): WaiverRow | null {
  return waivers.find((w) => w.checkKey === check.key && (w.recordId ?? null) === (check.recordId ?? null)) ?? null;
}

/** Applies waivers and puts the checks in a stable order (kind, then subject, then key). */
export function boardChecks(checks: ReadinessCheck[], waivers: WaiverRow[]): BoardCheck[] {
  return checks
    .map((c): BoardCheck => {
      const w = c.status === 'within-target' ? null : waiverFor(c, waivers);
      return {
        key: c.key,
        kind: c.kind,
        subject: c.subject,
        status: w ? 'waived' : c.status,
        measuredStatus: c.status,
        target: c.target,
        result: c.result,
        recordType: c.recordType,
        recordId: c.recordId,
        recordedAt: c.recordedAt,
        place: c.place,
        waiver: w ? { id: w.id, reason: w.reason, by: w.waivedByName, at: w.waivedAt.toISOString() } : null,
        // Kept with the check in the approval snapshot, so the certificate prints them as they stood.
        warnings: (c.warnings ?? []).map((w) => ({ code: w.code, message: w.message })),
        ...(c.series ? { series: c.series } : {}),
      };
    })
    .sort(
      (a, b) =>
        KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind) ||
        a.subject.localeCompare(b.subject) ||
        a.key.localeCompare(b.key),
    );
}

/** Checks that stop a request or an approval: not started or outside target, and not waived. */
export const blockingOf = (checks: BoardCheck[]) =>
  checks.filter((c) => c.status === 'not-started' || c.status === 'outside-target');

export const KIND_LABELS = Object.fromEntries(CHECK_KIND_NAMES.map((k) => [k, CHECK_KINDS[k].label])) as Record<
  CheckKind,
  string
>;

export const STATUS_LABELS: Record<BoardCheck['status'], string> = {
  'not-started': 'Not started',
  'within-target': 'Within target',
  'outside-target': 'Outside target',
  waived: 'Waived',
};
