import { Injectable, OnModuleInit } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import type { TargetValue } from '../database/schema/target-sets.js';
import { fromMm, isLengthUnit, toMm } from '../engine/units.js';
import type { ResultWarning } from '../engine/warnings.js';
import { finiteList } from '../common/stored-result.js';
import { HEIGHT_SOURCE, judgePair } from './rail-pair.js';
import {
  judgedFigure,
  referenceOf,
  REFERENCE_WORDS,
  showIn,
  targetLengthUnit,
  warningsForSweep,
} from './sweep-judgement.js';
import type { CheckSeries, MachineRef, ReadinessCheck, ReadinessContext } from '../records/readiness.js';
import { ReadinessRegistry } from '../records/readiness.registry.js';
import { SubjectsRegistry } from '../records/subjects.registry.js';
import { TargetSetsService } from '../target-sets/target-sets.service.js';
import { TARGET_LABELS, targetInBaseUnit } from '../target-sets/target-keys.js';
import { MachinesService } from '../machines/machines.service.js';
import type { ComparedSweep } from './rail-parallelism.js';
import {
  RailsRepository,
  type DatumSweep,
  type LatestSweep,
  type RailRow,
  type RailsWithNewestSweeps,
  type SweepRow,
} from './rails.repository.js';
import { RailsService } from './rails.service.js';
import { inLengthUnit, storedSweepResult, summaryReadable } from './rail.mapper.js';
import { UNREADABLE_INPUT } from '../common/stored-result.js';
import type { ParallelismResponse, RailHeightDifference } from './parallelism-response.js';

/** In the target's own length unit, so a result reads beside its target. */
function inUnit(mm: number, t: TargetValue) {
  return isLengthUnit(t.unit) ? fromMm(mm, t.unit) : mm;
}
function show(mm: number, t: TargetValue) {
  const unit = isLengthUnit(t.unit) ? t.unit : 'mm';
  const v = fromMm(mm, unit);
  const digits = unit === 'mm' ? 3 : unit === 'in' ? 4 : unit === 'um' ? 1 : 2;
  return `${v.toFixed(digits)} ${unit === 'um' ? 'µm' : unit}`;
}

/**
 * What the rails add to a machine's readiness: each rail's straightness and each partner pair's
 * parallelism, judged against the machine's current target set; and the parallelism route.
 */
@Injectable()
export class RailChecksService implements OnModuleInit {
  constructor(
    private readonly repo: RailsRepository,
    private readonly rails: RailsService,
    private readonly machines: MachinesService,
    private readonly targetSets: TargetSetsService,
    private readonly readiness: ReadinessRegistry,
    private readonly subjects: SubjectsRegistry,
  ) {}

  onModuleInit() {
    this.readiness.register({
      checksFor: (m, context) => this.checksFor(m, context),
      firstRead: {
        sql: (workshopId, machineId) => this.repo.railsWithNewestSweepsAsJson(workshopId, machineId),
        checks: (value, m, context) =>
          this.checksFromRails(this.repo.railsWithNewestSweepsFrom(value as Record<string, unknown>[]), m, context),
      },
    });
    this.subjects.register('rail', async (workshopId, id) => {
      const rail = await this.repo.findRail(workshopId, id);
      return rail ? { machineId: rail.machineId, recordType: 'rail', recordId: id, label: `Rail ${rail.label}` } : null;
    });
    this.subjects.register('rail-sweep', async (workshopId, id) => {
      const sweep = await this.repo.findSweep(workshopId, id);
      if (!sweep) return null;
      const rail = await this.repo.findRail(workshopId, sweep.railId);
      return {
        machineId: sweep.machineId,
        recordType: 'rail-sweep',
        recordId: id,
        label: `Sweep of rail ${rail?.label ?? ''} (${sweep.phase}, ${sweep.takenAt.toISOString().slice(0, 10)})`,
      };
    });
  }

  /**
   * Two queries whatever the history: the rails with the newest sweep of each (summary columns),
   * and the newest sweep of each rail per datum and face (for the partner pairs); a third for the
   * certificate's series when they are asked for.
   */
  async checksFor(machine: MachineRef, context: ReadinessContext): Promise<ReadinessCheck[]> {
    return this.checksFromRails(
      await this.repo.railsWithNewestSweeps(machine.workshopId, machine.id),
      machine,
      context,
    );
  }

  /** The checks from the rails and their newest sweeps (the first read), reading the rest it needs. */
  private async checksFromRails(
    { rails, latest }: RailsWithNewestSweeps,
    machine: MachineRef,
    context: ReadinessContext,
  ): Promise<ReadinessCheck[]> {
    if (!rails.length) return [];
    const targets = {
      straightness: context.targets.railStraightness,
      parallelism: context.targets.railParallelism,
      height: context.targets.railHeightDifference,
    };
    const paired = pairs(rails);
    const ids = rails.map((r) => r.id);
    const perDatum = paired.length ? await this.repo.latestSweepsPerDatum(machine.workshopId, ids) : [];
    const full = context.series
      ? new Map(
          (
            await this.repo.sweepsByIds(
              machine.workshopId,
              [...latest.values()].map((s) => s.id),
            )
          ).map((s) => [s.id, s]),
        )
      : null;
    const checks = rails.map((r) => {
      const newest = latest.get(r.id) ?? null;
      const check = this.straightnessCheck(r, newest, targets.straightness);
      const row = newest && full?.get(newest.id);
      if (row && check.result) check.series = straightnessSeries(r, row, targets.straightness);
      return check;
    });
    for (const [a, b] of paired)
      checks.push(
        this.parallelismCheck(
          a,
          b,
          comparedOf(a.id, latest, perDatum),
          comparedOf(b.id, latest, perDatum),
          targets,
          context.series,
        ),
      );
    return checks;
  }

  /** GET /api/rails/:id/parallelism: this rail is A, its partner B. */
  async parallelismOf(actor: SessionUser, railId: string): Promise<ParallelismResponse> {
    const rail = await this.rails.findRow(actor, railId);
    const machine = await this.machines.getRef(actor, rail.machineId);
    const targets = await this.targetsOf(actor.workshopId, machine.targetSetId);
    const shownTargets = {
      parallelism: plain(targets.parallelism),
      heightDifference: { ...plain(targets.height), source: HEIGHT_SOURCE },
    };
    const partner = rail.partnerRailId ? await this.repo.findRail(actor.workshopId, rail.partnerRailId) : null;
    if (!partner) {
      return {
        railId,
        partnerRailId: null,
        status: 'not-comparable' as const,
        reason: `Rail ${rail.label} has no partner rail`,
        targets: shownTargets,
        warnings: [],
      };
    }
    const [latest, perDatum] = await Promise.all([
      this.repo.latestSweeps(actor.workshopId, [rail.id, partner.id]),
      this.repo.latestSweepsPerDatum(actor.workshopId, [rail.id, partner.id]),
    ]);
    const j = judgePair(
      rail,
      partner,
      comparedOf(rail.id, latest, perDatum),
      comparedOf(partner.id, latest, perDatum),
      targets,
    );
    const out = j.parallelism;
    const height: RailHeightDifference = {
      measured: j.height.measured,
      reason: j.height.reason ?? null,
      datum: j.height.datum ?? null,
      /** Largest height difference between the rails, mm. */
      worst: j.height.worstMm ?? null,
      /** The same with its sign, mm. */
      worstSigned: j.height.worstSignedMm ?? null,
      /** Where it was found along the rails, mm. */
      at: j.height.atMm ?? null,
      /** Height difference at each compared position, mm. */
      differences: j.height.differencesMm ?? null,
      /** Distance between the rails, mm. */
      spacing: j.height.spacingMm ?? null,
      kUmPerMm: j.height.kUmPerMm ?? null,
      /** Permissible height difference (spacing × K), mm. */
      permissible: j.height.permissibleMm ?? null,
      targetText: j.height.targetText ?? null,
      within: j.height.within ?? null,
      unit: 'mm',
    };
    const base = {
      railId,
      partnerRailId: partner.id,
      targets: shownTargets,
      sweeps: { a: out.a?.id ?? null, b: out.b?.id ?? null },
      height,
      warnings: j.warnings,
    };
    if (!out.comparable && j.status !== 'within-target' && j.status !== 'outside-target')
      return { ...base, status: 'not-comparable' as const, reason: out.reason };
    if (!out.comparable && out.unreadable)
      return { ...base, status: 'not-comparable' as const, reason: out.reason, unreadable: UNREADABLE_INPUT };
    return {
      ...base,
      status: j.status as 'within-target' | 'outside-target',
      ...(out.comparable
        ? {
            datum: out.datum,
            face: out.a.face ?? 'side',
            /** Parallelism of the two rails, mm. */
            parallelism: out.parallelismMm,
            /** Mean of the differences between the rails, mm. */
            meanOffset: out.meanOffsetMm,
            /** Positions along the rails the two sweeps are compared at, mm. */
            positions: out.positionsMm,
            /** Difference between the rails at each position, mm. */
            differences: out.differencesMm,
            parallelismWithin: j.parallelismWithin,
          }
        : { reason: out.reason, parallelism: null, parallelismWithin: null }),
      heightDifferenceWithin: j.height.within ?? null,
    };
  }

  private async targetsOf(workshopId: string, targetSetId: string) {
    const { targets } = await this.targetSets.findRow(workshopId, targetSetId);
    return {
      straightness: targets.railStraightness,
      parallelism: targets.railParallelism,
      height: targets.railHeightDifference,
    };
  }

  private straightnessCheck(rail: RailRow, latest: LatestSweep | null, target: TargetValue): ReadinessCheck {
    const reference = referenceOf(target);
    const common = {
      key: `straightness:${rail.id}`,
      kind: 'rail-straightness' as const,
      // "Rail Y1 (left)" already names its axis; "Rail left" gets it added.
      subject: rail.label.includes(rail.axis) ? `Rail ${rail.label}` : `Rail ${rail.label} (${rail.axis})`,
      target: {
        ...plain(target),
        reference,
        label: `${TARGET_LABELS.railStraightness}, judged on the ${REFERENCE_WORDS[reference]}`,
      },
      place: { machineId: rail.machineId, railId: rail.id },
      warnings: [] as ResultWarning[],
    };
    if (!latest)
      return { ...common, status: 'not-started', result: null, recordType: null, recordId: null, recordedAt: null };
    if (!summaryReadable(latest)) {
      // A latest sweep that cannot be read blocks like a failed one and says why.
      return {
        ...common,
        subject: `${common.subject} (latest sweep unreadable)`,
        status: 'outside-target',
        result: null,
        recordType: 'rail-sweep',
        recordId: latest.id,
        recordedAt: latest.takenAt.toISOString(),
      };
    }
    const judged = judgedFigure(latest, reference);
    const other =
      reference === 'minimum-zone'
        ? `least squares ${show(latest.leastSquaresStraightness, target)}`
        : `minimum zone ${show(latest.minimumZoneStraightness, target)}`;
    const slope =
      latest.localSlopeMmPerM === null ? '' : `; largest local slope ${latest.localSlopeMmPerM.toFixed(3)} mm/m`;
    const resolutionMm = latest.resolution === null ? null : toMm(latest.resolution, latest.readingUnit);
    return {
      ...common,
      status: judged <= targetInBaseUnit(target) ? 'within-target' : 'outside-target',
      result: {
        value: inUnit(judged, target),
        unit: target.unit,
        summary: `${capital(REFERENCE_WORDS[reference])} ${show(judged, target)} against ${unitWord(target)} (${other})${slope} (${latest.phase}, ${latest.face} face, ${latest.stationCount} stations)`,
      },
      recordType: 'rail-sweep',
      recordId: latest.id,
      recordedAt: latest.takenAt.toISOString(),
      warnings: warningsForSweep(
        { stationCount: latest.stationCount, resolutionMm, readingUnit: latest.readingUnit, spanMm: latest.spanMm },
        rail.lengthMm,
        target,
        rail.lengthUnit,
      ),
    };
  }

  private parallelismCheck(
    a: RailRow,
    b: RailRow,
    sa: ComparedSweep[],
    sb: ComparedSweep[],
    t: { parallelism: TargetValue; height: TargetValue },
    withSeries: boolean,
  ): ReadinessCheck {
    const j = judgePair(a, b, sa, sb, t);
    const out = j.parallelism;
    const common = {
      key: `parallelism:${a.id}:${b.id}`,
      kind: 'rail-parallelism' as const,
      subject: `Rails ${a.label} and ${b.label}`,
      target: { ...plain(t.parallelism), label: TARGET_LABELS.railParallelism },
      place: { machineId: a.machineId, railId: a.id },
      warnings: j.warnings,
    };
    if (!out.comparable && out.unreadable) {
      const bad = out.a!.takenAt >= out.b!.takenAt ? out.a! : out.b!;
      return {
        ...common,
        subject: `${common.subject} (latest sweep unreadable: ${out.reason})`,
        status: 'outside-target',
        result: null,
        recordType: 'rail-sweep',
        recordId: bad.id,
        recordedAt: bad.takenAt.toISOString(),
      };
    }
    if (j.status === 'not-started') {
      // No number to show yet; the reason goes with the subject so the board says what is missing.
      return {
        ...common,
        subject: `${common.subject} (${out.comparable ? 'no height yet' : out.reason})`,
        status: 'not-started',
        result: null,
        recordType: null,
        recordId: null,
        recordedAt: null,
      };
    }
    const h = j.height;
    const heightText = h.measured
      ? `worst-station height difference ${show(h.worstMm!, t.parallelism)} at ${showIn(h.atMm!, a.lengthUnit)} (target ${h.targetText}${h.within ? '' : ', outside'}; top face, datum ${h.datum})`
      : 'no height difference (needs top-face sweeps against one common datum)';
    const parallelText = out.comparable
      ? `Parallelism ${show(out.parallelismMm, t.parallelism)} (target ${unitWord(t.parallelism)}, ${out.a.face ?? 'side'} face, datum ${out.datum})`
      : `No parallelism yet (${out.reason})`;
    const newer = out.comparable ? (out.a.takenAt >= out.b.takenAt ? out.a : out.b) : null;
    const check: ReadinessCheck = {
      ...common,
      status: j.status,
      result: {
        value: out.comparable ? inUnit(out.parallelismMm, t.parallelism) : inUnit(h.worstMm!, t.parallelism),
        unit: t.parallelism.unit,
        summary: `${parallelText}; ${heightText}`,
      },
      recordType: 'rail-sweep',
      recordId: newer?.id ?? null,
      recordedAt: newer?.takenAt.toISOString() ?? null,
    };
    if (withSeries && out.comparable)
      check.series = parallelismSeries(a, b, out.positionsMm, out.differencesMm, t.parallelism);
    return check;
  }
}

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/**
 * Residuals of the judged reference line per station, in the sweep's reading unit, centred on the
 * zone's middle so the tolerance band is ±t/2 around zero.
 */
function straightnessSeries(rail: RailRow, row: SweepRow, target: TargetValue): CheckSeries | undefined {
  const result = storedSweepResult(row.result);
  if (!result || !finiteList(row.positionsMm) || row.positionsMm.length !== result.leastSquares.residuals.length)
    return undefined;
  const reference = referenceOf(target);
  const residuals = reference === 'least-squares' ? result.leastSquares.residuals : result.minimumZone.residuals;
  const mid = (Math.max(...residuals) + Math.min(...residuals)) / 2;
  const ru = row.readingUnit;
  const lu = row.lengthUnit;
  const halfBand = fromMm(targetInBaseUnit(target) / 2, ru);
  const order = row.positionsMm.map((p, i) => i).sort((i, k) => row.positionsMm[i] - row.positionsMm[k]);
  return {
    title: `Rail ${rail.label}: residuals from the ${REFERENCE_WORDS[reference]}`,
    x: { label: 'Position along the rail', unit: unitLabel(lu) },
    y: { label: 'Deviation', unit: unitLabel(ru) },
    lines: [
      {
        label: `Sweep of ${row.takenAt.toISOString().slice(0, 10)} (${row.phase}, ${row.face} face)`,
        points: order.map(
          (i) => [inLengthUnit(row.positionsMm[i], lu), fromMm(residuals[i] - mid, ru)] as [number, number],
        ),
      },
    ],
    limits: [
      { label: `+t/2 (target ${unitWord(target)})`, value: halfBand },
      { label: `−t/2 (target ${unitWord(target)})`, value: -halfBand },
    ],
  };
}

/** B − A per station against the common datum, in the parallelism target's unit, with the band centred on the mean. */
function parallelismSeries(
  a: RailRow,
  b: RailRow,
  positionsMm: number[],
  differencesMm: number[],
  target: TargetValue,
): CheckSeries {
  const unit = targetLengthUnit(target);
  const mid = (Math.max(...differencesMm) + Math.min(...differencesMm)) / 2;
  const half = fromMm(targetInBaseUnit(target) / 2, unit);
  return {
    title: `Rails ${a.label} and ${b.label}: ${b.label} − ${a.label} against the common datum`,
    x: { label: 'Position along the rails', unit: unitLabel(a.lengthUnit) },
    y: { label: 'Difference', unit: unitLabel(unit) },
    lines: [
      {
        label: `${b.label} − ${a.label}`,
        points: positionsMm.map(
          (p, i) => [inLengthUnit(p, a.lengthUnit), fromMm(differencesMm[i] - mid, unit)] as [number, number],
        ),
      },
    ],
    limits: [
      { label: `+t/2 (target ${unitWord(target)})`, value: half },
      { label: `−t/2 (target ${unitWord(target)})`, value: -half },
    ],
  };
}

const unitLabel = (u: string) => (u === 'um' ? 'µm' : u);

const plain = (t: TargetValue) => ({ value: t.value, unit: t.unit });
const unitWord = (t: TargetValue) => `${t.value} ${t.unit === 'um' ? 'µm' : t.unit}`;

/**
 * A rail's sweeps as the comparison needs them, newest first: its newest sweep per datum (with
 * readings), and its newest sweep overall only to say that it has one (no datum, no readings).
 */
function comparedOf(railId: string, latest: Map<string, LatestSweep>, perDatum: DatumSweep[]): ComparedSweep[] {
  const own: ComparedSweep[] = perDatum.filter((s) => s.railId === railId);
  const newest = latest.get(railId);
  if (newest && !own.some((s) => s.id === newest.id))
    own.push({
      id: newest.id,
      datum: null,
      face: newest.face,
      takenAt: newest.takenAt,
      positionsMm: [],
      readingsMm: [],
    });
  return own.sort((x, y) => y.takenAt.getTime() - x.takenAt.getTime());
}

/** Each partner pair once, ids sorted so the check key is stable. */
function pairs(rails: RailRow[]): [RailRow, RailRow][] {
  const byId = new Map(rails.map((r) => [r.id, r]));
  const out: [RailRow, RailRow][] = [];
  for (const r of rails) {
    const p = r.partnerRailId ? byId.get(r.partnerRailId) : undefined;
    if (p && r.id < p.id && p.partnerRailId === r.id) out.push([r, p]);
  }
  return out;
}
