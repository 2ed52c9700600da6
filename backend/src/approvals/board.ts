import type { ReadinessCheck } from '../records/readiness.js';
import type { WaiverRow } from './approvals.repository.js';
import type { BoardCheck } from './snapshot.js';

const KIND_ORDER: ReadinessCheck['kind'][] = [
  'rail-straightness',
  'rail-parallelism',
  'travel-trial',
  'backlash',
  'positioning',
  'speed-check',
  'travel-envelope',
  'diagonal-check',
  'bed-grid',
  'test-cut',
  'safety-walk',
];

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
        link: c.link,
        waiver: w ? { id: w.id, reason: w.reason, by: w.waivedByName, at: w.waivedAt.toISOString() } : null,
        // Kept with the check in the approval snapshot, so the certificate prints them as they stood.
        warnings: (c.warnings ?? []).map((w) => ({ code: w.code, message: w.message })),
        ...(c.series ? { series: c.series } : {}),
      };
    })
    .sort((a, b) => KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind) || a.subject.localeCompare(b.subject) || a.key.localeCompare(b.key));
}

/** Checks that stop a request or an approval: not started or outside target, and not waived. */
export const blockingOf = (checks: BoardCheck[]) => checks.filter((c) => c.status === 'not-started' || c.status === 'outside-target');

export const KIND_LABELS: Record<ReadinessCheck['kind'], string> = {
  'rail-straightness': 'Rail straightness',
  'rail-parallelism': 'Rail parallelism',
  'travel-trial': 'Travel trial',
  backlash: 'Backlash check',
  positioning: 'Repeat-and-reverse run',
  'speed-check': 'Speed check',
  'travel-envelope': 'Travel envelope',
  'diagonal-check': 'Diagonal check',
  'bed-grid': 'Bed grid',
  'test-cut': 'Test cut',
  'safety-walk': 'Safety walk',
};

export const STATUS_LABELS: Record<BoardCheck['status'], string> = {
  'not-started': 'Not started',
  'within-target': 'Within target',
  'outside-target': 'Outside target',
  waived: 'Waived',
};
