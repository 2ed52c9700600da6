import type { SQL } from 'drizzle-orm';
import type { TargetValue } from '../database/schema/target-sets.js';
import type { ResultWarning } from '../engine/warnings.js';
import { targetInBaseUnit, type TargetKey } from '../target-sets/target-keys.js';
import type { CheckKind, SignedRecordType } from './kinds.js';

export type CheckStatus = 'not-started' | 'within-target' | 'outside-target' | 'waived';

/**
 * One required check of a machine as the readiness board shows it. Each domain module reports
 * its own checks (rails, drives, frame, safety); the approvals module puts them together.
 */
export interface ReadinessCheck {
  /** Stable across rounds: the same check of the same subject keeps its key (e.g. "straightness:<railId>"). */
  key: string;
  /** One of the registry's check kinds (records/kinds.ts). */
  kind: CheckKind;
  /** What is checked, in words: "Rail Y1 (left)", "Axis X". */
  subject: string;
  status: Exclude<CheckStatus, 'waived'>;
  target: (TargetValue & { label?: string }) | null;
  /** The headline result in a display unit, with a one-line summary. */
  result: { value: number; unit: string; summary: string } | null;
  /** The record the result comes from; approvals lock it. */
  recordType: SignedRecordType | null;
  recordId: string | null;
  recordedAt: string | null;
  /** Where the check's record is shown, as data: the front end makes the link from it. */
  place: CheckPlace;
  /**
   * Optional small data series behind the result (a few hundred points at most), kept in the
   * approval snapshot and drawn on the certificate: residuals per station for straightness,
   * mean deviation per target position for positioning, the measured rectangle for squareness.
   */
  series?: CheckSeries;
  /** What a person should know about the result (see engine/warnings.ts); empty when none. */
  warnings?: ResultWarning[];
}

/**
 * A machine's screen, as ids: its file (on a tab), one of its rails or one of its axes. The API
 * answers carry no screen paths; the front end turns this into a link (features/approvals/check-place.ts).
 */
export type CheckPlace =
  | { machineId: string; tab: 'readiness' | 'frame' | 'safety' | 'drives' | 'rails' }
  | { machineId: string; railId: string }
  | { machineId: string; axisId: string };

/** A chart's data in the units it is drawn in: lines of [x, y] points and optional limit lines. */
export interface CheckSeries {
  title?: string;
  x: { label: string; unit: string };
  y: { label: string; unit: string };
  lines: { label: string; points: [number, number][] }[];
  /** Horizontal limits, e.g. the tolerance band (+t/2 and -t/2) in the y unit. */
  limits?: { label: string; value: number }[];
}

export interface MachineRef {
  id: string;
  workshopId: string;
  targetSetId: string;
  kind: string;
  workAreaXMm: number;
  workAreaYMm: number;
}

/**
 * What one readiness read shares between contributors: the machine's target set, read once by
 * the caller, and whether the certificate's data series are wanted (only the approval snapshot
 * wants them; the board and the machines list read summary columns only).
 */
export interface ReadinessContext {
  targets: Record<string, TargetValue>;
  series: boolean;
  /** Reads several contributors need (a machine's axes), made once per evaluation: see readOnce. */
  reads?: Map<string, Promise<unknown>>;
}

/**
 * A read shared by the contributors of one evaluation: the first to ask makes it, the others
 * wait for the same answer, so the board does not send the same statement twice. `key` names
 * the read and its machine ("axes:<machine id>").
 */
export function readOnce<T>(context: ReadinessContext, key: string, load: () => Promise<T>): Promise<T> {
  context.reads ??= new Map();
  let read = context.reads.get(key) as Promise<T> | undefined;
  if (!read) {
    // Resolved once into a promise: a query builder is only a thenable, and runs again on every await.
    read = Promise.resolve(load());
    context.reads.set(key, read);
  }
  return read;
}

/** A target of the context's set as TargetSetsService.targetFor gives it: stored, and in mm (lengths) or as stored. */
export function targetIn(context: ReadinessContext, key: TargetKey): { target: TargetValue; base: number } {
  const target = context.targets[key];
  return { target, base: targetInBaseUnit(target) };
}

export interface ReadinessContributor {
  checksFor(machine: MachineRef, context: ReadinessContext): Promise<ReadinessCheck[]>;
  /**
   * Optionally, the contributor's first read as one SQL expression whose value is JSON, and its
   * checks from that value (reading more itself if it must). A recount after a recorded check
   * sends that read in the statement that reads the machine's context: one round trip less.
   */
  firstRead?: {
    sql(workshopId: string, machineId: string): SQL;
    checks(value: unknown, machine: MachineRef, context: ReadinessContext): Promise<ReadinessCheck[]>;
  };
}
