import { Injectable, OnModuleInit } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import type { PositioningResult } from '../engine/positioning.js';
import type { TravelTrialResult } from '../engine/travel-trial.js';
import { MachinesService } from '../machines/machines.service.js';
import { targetIn, type MachineRef, type ReadinessCheck, type ReadinessContext } from '../records/readiness.js';
import { ReadinessRegistry } from '../records/readiness.registry.js';
import { axesOf } from './axes-of-machine.js';
import { RecordsService } from '../records/records.service.js';
import { TARGET_LABELS } from '../target-sets/target-keys.js';
import { AxesRepository, type AxisRow } from './axes.repository.js';
import { AxesService } from './axes.service.js';
import type { AxisCheckSummary, AxisResponse } from './axis.mapper.js';
import { AxisChecksRepository } from './axis-checks.repository.js';
import { positioningVerdicts, travelTrialStatus } from './drive-status.js';
import { DriveTargetsService, type DriveTargetKey, type DriveTargets } from './drive-targets.js';
import { speedCheckOf } from './speed-check.js';
import { travelEnvelopeOf } from './travel-envelope.js';
import { storedPositioning, storedTravelTrial } from './axis-check.mapper.js';
import { readableResult, UNREADABLE_RESULT } from '../common/stored-result.js';
import { storedWarnings } from './result-warnings.js';
import type { ResultWarning } from '../engine/warnings.js';

const fmt = (v: number, d = 3) => v.toFixed(d);

// The headline figures the board and the Drives tab read; the whole result (with the moves and
// per-target means) is read only for the certificate's series.
const trialFigures = (stored: unknown) =>
  readableResult<Pick<TravelTrialResult, 'errorPercent' | 'correctedStepsPerMm'>>(stored, [
    'errorPercent',
    'correctedStepsPerMm',
  ]);
const runFigures = (stored: unknown) =>
  readableResult<Pick<PositioningResult, 'accuracyMm' | 'repeatabilityMm' | 'reversalMm'>>(stored, [
    'accuracyMm',
    'repeatabilityMm',
    'reversalMm',
  ]);

const DRIVE_TARGET_KEYS: Record<DriveTargetKey, true> = {
  stepsPerMmError: true,
  positioningAccuracy: true,
  repeatability: true,
  reversal: true,
  screwSpeedHeadroom: true,
  travelMargin: true,
};

/** The drive targets out of a target set read once for the whole readiness read. */
function driveTargetsOf(context: ReadinessContext): DriveTargets {
  return Object.fromEntries(
    (Object.keys(DRIVE_TARGET_KEYS) as DriveTargetKey[]).map((k) => [k, targetIn(context, k)]),
  ) as DriveTargets;
}
/** Feeds in inches keep two decimals; in mm, µm or thou a whole number is enough. */
const formatFeed = (v: number, unit: string) => (unit === 'in' ? v.toFixed(2) : String(Math.round(v)));

/** The speed check says when the d·n limit, not whirling, sets the top speed (the easily missed one). */
function speedWarnings(speed: ReturnType<typeof speedCheckOf>): ResultWarning[] {
  if (speed.rpm === null || speed.limitedBy !== 'dn-limit') return [];
  return [
    {
      code: 'dn-limit-governs',
      message: `The screw's d·n limit (${speed.dnLimit} ÷ nominal diameter = ${Math.round(speed.dnLimitSpeed!)} rpm) is lower than its permissible whirling speed (${Math.round(speed.permissibleSpeed!)} rpm): headroom is measured from the d·n limit.`,
    },
  ];
}

/**
 * The drive checks of a machine as the readiness board and the Drives tab see them: per axis the
 * latest travel trial, the latest repeat-and-reverse run and (screw axes) the speed check, and
 * one travel-envelope check per machine, each against the machine's current target set.
 */
@Injectable()
export class DriveChecksService implements OnModuleInit {
  constructor(
    private readonly axesRepo: AxesRepository,
    private readonly axes: AxesService,
    private readonly checks: AxisChecksRepository,
    private readonly machines: MachinesService,
    private readonly targets: DriveTargetsService,
    private readonly readiness: ReadinessRegistry,
    private readonly records: RecordsService,
  ) {}

  onModuleInit() {
    this.readiness.register({ checksFor: (machine, context) => this.checksFor(machine, context) });
    this.axes.onAxisSaved((actor, row, before) => this.axisSaved(actor, row, before));
  }

  /**
   * The speed check and the travel envelope are worked out from the drive record rather than
   * saved: when a save changes what they rest on, they count as recorded (audit, approvals).
   */
  private async axisSaved(actor: SessionUser, row: AxisRow, before: AxisRow | null) {
    const machine = await this.machines.getRef(actor, row.machineId);
    const targets = await this.targets.forMachine(machine);
    const changed = (keys: (keyof AxisRow)[]) =>
      !before || keys.some((k) => JSON.stringify(before[k]) !== JSON.stringify(row[k]));
    const speed = speedCheckOf(row, targets);
    if (speed.rpm !== null && changed(['drive', 'maxFeedRateMmPerMin'])) {
      await this.records.checkRecorded(
        actor,
        {
          machineId: machine.id,
          kind: 'speed-check',
          recordType: 'axis',
          recordId: row.id,
          status: speed.status as 'within-target' | 'outside-target',
        },
        `Speed check of axis ${row.name}: ${Math.round(speed.rpm)} rpm at ${speed.feedRate} ${speed.lengthUnit}/min, permissible ${Math.round(speed.permissibleSpeed!)} rpm, d·n limit ${Math.round(speed.dnLimitSpeed!)} rpm, ${speed.headroomPercent!.toFixed(0)} % headroom`,
      );
    }
    if (row.measuredTravelMm !== null && changed(['measuredTravelMm', 'name'])) {
      const envelope = travelEnvelopeOf(machine, await this.axesRepo.list(machine.workshopId, machine.id), targets);
      if (envelope.status !== 'not-started' && envelope.axes.some((a) => a.axisId === row.id)) {
        await this.records.checkRecorded(
          actor,
          {
            machineId: machine.id,
            kind: 'travel-envelope',
            recordType: 'axis',
            recordId: row.id,
            status: envelope.status,
          },
          `Travel envelope: ${envelope.summary}`,
        );
      }
    }
  }

  async checksFor(machine: MachineRef, context: ReadinessContext): Promise<ReadinessCheck[]> {
    const rows = await axesOf(this.axesRepo, machine, context);
    const targets = driveTargetsOf(context);
    const perAxis = await this.axisChecks(machine, rows, targets, context.series);
    const envelope = travelEnvelopeOf(machine, rows, targets);
    const envelopeCheck: ReadinessCheck = {
      key: `travel-envelope:${machine.id}`,
      kind: 'travel-envelope',
      subject: 'Travel envelope (X and Y)',
      status: envelope.status,
      target: { ...envelope.margin, label: TARGET_LABELS.travelMargin },
      result: envelope.axes.some((a) => a.spare !== null)
        ? // The smallest margin beyond the work area, read against the margin the target asks for.
          {
            value: Math.min(
              ...envelope.axes.filter((a) => a.measuredTravel !== null).map((a) => a.measuredTravel! - a.workSize),
            ),
            unit: 'mm',
            summary: envelope.summary,
          }
        : null,
      recordType: null,
      recordId: null,
      recordedAt: null,
      place: { machineId: machine.id, tab: 'drives' },
    };
    return [...perAxis.flatMap((a) => a.checks), envelopeCheck];
  }

  /** GET /api/machines/:id/axes: each axis with its latest statuses. */
  async listWithChecks(
    actor: SessionUser,
    machineId: string,
  ): Promise<(AxisResponse & { checks: Record<'travelTrial' | 'positioning' | 'speedCheck', AxisCheckSummary> })[]> {
    const machine = await this.machines.getRef(actor, machineId);
    const rows = await this.axesRepo.list(actor.workshopId, machineId);
    const [responses, targets] = await Promise.all([this.axes.respondMany(rows), this.targets.forMachine(machine)]);
    const perAxis = await this.axisChecks(machine, rows, targets, false);
    return responses.map((axis, i) => {
      const [travelTrial, positioning, speedCheck] = perAxis[i].summaries;
      return { ...axis, checks: { travelTrial, positioning, speedCheck } };
    });
  }

  async travelEnvelope(actor: SessionUser, machineId: string) {
    const machine = await this.machines.getRef(actor, machineId);
    const rows = await this.axesRepo.list(actor.workshopId, machineId);
    return travelEnvelopeOf(machine, rows, await this.targets.forMachine(machine));
  }

  async speedCheck(actor: SessionUser, axisId: string) {
    const row = await this.axes.findRow(actor, axisId);
    const machine = await this.machines.getRef(actor, row.machineId);
    return speedCheckOf(row, await this.targets.forMachine(machine));
  }

  private async axisChecks(machine: MachineRef, rows: AxisRow[], targets: DriveTargets, series: boolean) {
    const ids = rows.map((r) => r.id);
    const [trials, runs] = await Promise.all([
      this.checks.latestTrials(machine.workshopId, ids, series),
      this.checks.latestRuns(machine.workshopId, ids, series),
    ]);
    return rows.map((axis) => {
      const place = { machineId: machine.id, axisId: axis.id };
      const out: ReadinessCheck[] = [];
      const summaries: AxisCheckSummary[] = [];

      const trial = trials.get(axis.id);
      const tr = trial ? (series ? storedTravelTrial(trial.result) : trialFigures(trial.result)) : null;
      const moves = tr && 'moves' in tr ? (tr as TravelTrialResult).moves : null;
      // A latest trial that cannot be read blocks like a failed one and says why.
      const trialUnreadable = trial !== undefined && tr === null;
      const trialSummary = tr
        ? `${fmt(tr.errorPercent)} % scale error at ${trial!.stepsPerMmUsed} steps/mm; corrected ${fmt(tr.correctedStepsPerMm, 4)} steps/mm${trial!.appliedAt ? ' (applied — record a confirming trial)' : ''}`
        : trialUnreadable
          ? UNREADABLE_RESULT
          : 'No travel trial recorded yet';
      const trialStatus = tr
        ? travelTrialStatus(tr.errorPercent, targets)
        : trialUnreadable
          ? 'outside-target'
          : 'not-started';
      out.push({
        key: `travel-trial:${axis.id}`,
        kind: 'travel-trial',
        subject: trialUnreadable ? `Axis ${axis.name} (latest travel trial unreadable)` : `Axis ${axis.name}`,
        status: trialStatus,
        target: { ...targets.stepsPerMmError.target, label: TARGET_LABELS.stepsPerMmError },
        // The size of the error against the ± target; the summary keeps its sign.
        result: tr ? { value: Math.abs(tr.errorPercent), unit: '%', summary: trialSummary } : null,
        recordType: trial ? 'travel-trial' : null,
        recordId: trial?.id ?? null,
        warnings: trial ? storedWarnings(trial.result) : [],
        recordedAt: trial?.createdAt.toISOString() ?? null,
        place,
        ...(moves
          ? {
              series: {
                title: 'Error of each move against the commanded distance',
                x: { label: 'Commanded', unit: 'mm' },
                y: { label: 'Measured − commanded', unit: 'mm' },
                lines: [
                  {
                    label: `At ${trial!.stepsPerMmUsed} steps/mm`,
                    points: moves.map((m): [number, number] => [m.commandedMm, m.errorMm]),
                  },
                ],
              },
            }
          : {}),
      });
      summaries.push({
        status: trialStatus,
        summary: trialSummary,
        headline: tr ? `${tr.errorPercent >= 0 ? '+' : ''}${fmt(tr.errorPercent)} % scale error` : null,
        recordId: trial?.id ?? null,
        recordedAt: trial?.createdAt.toISOString() ?? null,
      });

      const run = runs.get(axis.id);
      const pr = run ? (series ? storedPositioning(run.result) : runFigures(run.result)) : null;
      const perTarget = pr && 'targets' in pr ? (pr as PositioningResult).targets : null;
      const runUnreadable = run !== undefined && pr === null;
      const verdict = pr
        ? positioningVerdicts(
            { accuracy: pr.accuracyMm, repeatability: pr.repeatabilityMm, reversal: pr.reversalMm },
            targets,
          )
        : runUnreadable
          ? { status: 'outside-target' as const }
          : null;
      const runSummary = pr
        ? `accuracy ${fmt(pr.accuracyMm)} mm, repeatability ${fmt(pr.repeatabilityMm)} mm, reversal ${fmt(pr.reversalMm)} mm`
        : runUnreadable
          ? UNREADABLE_RESULT
          : 'No repeat-and-reverse run recorded yet';
      const t = targets;
      out.push({
        key: `positioning:${axis.id}`,
        kind: 'positioning',
        subject: runUnreadable ? `Axis ${axis.name} (latest repeat-and-reverse run unreadable)` : `Axis ${axis.name}`,
        status: verdict?.status ?? 'not-started',
        target: {
          ...t.positioningAccuracy.target,
          label: `${TARGET_LABELS.positioningAccuracy} ≤ ${t.positioningAccuracy.target.value} ${t.positioningAccuracy.target.unit}, repeatability ≤ ${t.repeatability.target.value} ${t.repeatability.target.unit}, reversal ≤ ${t.reversal.target.value} ${t.reversal.target.unit}`,
        },
        result: pr ? { value: pr.accuracyMm, unit: 'mm', summary: runSummary } : null,
        recordType: run ? 'positioning-run' : null,
        recordId: run?.id ?? null,
        warnings: run ? storedWarnings(run.result) : [],
        recordedAt: run?.createdAt.toISOString() ?? null,
        place,
        ...(perTarget
          ? {
              series: {
                title: 'Mean deviation at each target, approached up and down',
                x: { label: 'Target', unit: 'mm' },
                y: { label: 'Mean deviation', unit: 'um' },
                // ISO 230-2: the accuracy A spans the lowest mean − 2s to the highest mean + 2s
                // over both directions, so the band edges are drawn beside the means; the limits
                // centre a band as wide as the accuracy target on zero.
                lines: [
                  { label: 'Mean up', points: perTarget.map((p): [number, number] => [p.targetMm, p.meanUpMm * 1000]) },
                  {
                    label: 'Mean up + 2s',
                    points: perTarget.map((p): [number, number] => [p.targetMm, (p.meanUpMm + 2 * p.sUpMm) * 1000]),
                  },
                  {
                    label: 'Mean up − 2s',
                    points: perTarget.map((p): [number, number] => [p.targetMm, (p.meanUpMm - 2 * p.sUpMm) * 1000]),
                  },
                  {
                    label: 'Mean down',
                    points: perTarget.map((p): [number, number] => [p.targetMm, p.meanDownMm * 1000]),
                  },
                  {
                    label: 'Mean down + 2s',
                    points: perTarget.map((p): [number, number] => [p.targetMm, (p.meanDownMm + 2 * p.sDownMm) * 1000]),
                  },
                  {
                    label: 'Mean down − 2s',
                    points: perTarget.map((p): [number, number] => [p.targetMm, (p.meanDownMm - 2 * p.sDownMm) * 1000]),
                  },
                ],
                limits: [
                  {
                    label: `+A/2 (accuracy target ${t.positioningAccuracy.target.value} ${t.positioningAccuracy.target.unit})`,
                    value: (t.positioningAccuracy.base / 2) * 1000,
                  },
                  { label: '−A/2', value: (-t.positioningAccuracy.base / 2) * 1000 },
                ],
              },
            }
          : {}),
      });
      summaries.push({
        status: verdict?.status ?? 'not-started',
        summary: runSummary,
        headline: pr ? `accuracy ${fmt(pr.accuracyMm)} mm` : null,
        recordId: run?.id ?? null,
        recordedAt: run?.createdAt.toISOString() ?? null,
      });

      const speed = speedCheckOf(axis, targets);
      const speedSummary =
        speed.rpm !== null
          ? `${Math.round(speed.rpm)} rpm at ${speed.feedRate} ${speed.lengthUnit}/min; permissible ${Math.round(speed.permissibleSpeed!)} rpm, d·n limit ${Math.round(speed.dnLimitSpeed!)} rpm${speed.rpm > speed.dnLimitSpeed! ? ' (above the d·n limit)' : ''}; ${speed.headroomPercent!.toFixed(0)} % headroom below the lower of the two; highest safe feed ${formatFeed(speed.safeFeedRate!, speed.lengthUnit)} ${speed.lengthUnit}/min`
          : speed.reason!;
      if (speed.applicable) {
        out.push({
          key: `speed-check:${axis.id}`,
          kind: 'speed-check',
          subject: `Axis ${axis.name}`,
          status: speed.status as ReadinessCheck['status'],
          target: {
            ...targets.screwSpeedHeadroom.target,
            label: `${TARGET_LABELS.screwSpeedHeadroom}, and within the d·n limit`,
          },
          // Headroom below the lower of the permissible and the d·n limit speeds, read against the headroom the target asks for.
          result: speed.rpm !== null ? { value: speed.headroomPercent!, unit: '%', summary: speedSummary } : null,
          warnings: speedWarnings(speed),
          recordType: 'axis',
          recordId: axis.id,
          recordedAt: speed.rpm !== null ? axis.updatedAt.toISOString() : null,
          place,
        });
      }
      summaries.push({
        status: speed.status,
        summary: speedSummary,
        headline:
          speed.rpm !== null ? `${Math.round(speed.rpm)} of ${Math.round(speed.allowedSpeed!)} rpm allowed` : null,
        recordId: speed.applicable ? axis.id : null,
        recordedAt: null,
      });
      return { checks: out, summaries };
    });
  }
}
