import { Injectable, OnModuleInit } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import type { TargetValue } from '../database/schema/target-sets.js';
import { fromMm, isLengthUnit } from '../engine/units.js';
import type { MachineRef, ReadinessCheck, ReadinessContext } from '../records/readiness.js';
import { ReadinessRegistry } from '../records/readiness.registry.js';
import { SubjectsRegistry } from '../records/subjects.registry.js';
import { TargetSetsService } from '../target-sets/target-sets.service.js';
import { TARGET_LABELS, targetInBaseUnit } from '../target-sets/target-keys.js';
import { MachinesService } from '../machines/machines.service.js';
import { partnerParallelism, type ComparedSweep } from './rail-parallelism.js';
import { RailsRepository, type DatumSweep, type LatestSweep, type RailRow } from './rails.repository.js';
import { RailsService } from './rails.service.js';
import { summaryReadable } from './rail.mapper.js';
import { UNREADABLE_INPUT } from '../common/stored-result.js';

const railLink = (machineId: string, railId: string) => `/machines/${machineId}/rails/${railId}`;

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
    this.readiness.register({ checksFor: (m, context) => this.checksFor(m, context) });
    this.subjects.register('rail', async (workshopId, id) => {
      const rail = await this.repo.findRail(workshopId, id);
      return rail ? { machineId: rail.machineId, recordType: 'rail', recordId: id, label: `Rail ${rail.label}` } : null;
    });
    this.subjects.register('rail-sweep', async (workshopId, id) => {
      const sweep = await this.repo.findSweep(workshopId, id);
      if (!sweep) return null;
      const rail = await this.repo.findRail(workshopId, sweep.railId);
      return { machineId: sweep.machineId, recordType: 'rail-sweep', recordId: id, label: `Sweep of rail ${rail?.label ?? ''} (${sweep.phase}, ${sweep.takenAt.toISOString().slice(0, 10)})` };
    });
  }

  /**
   * Three queries whatever the history: the rails, the newest sweep of each (summary columns),
   * and the newest sweep of each rail per datum (for the partner pairs).
   */
  async checksFor(machine: MachineRef, context: ReadinessContext): Promise<ReadinessCheck[]> {
    const rails = await this.repo.listRails(machine.workshopId, machine.id);
    if (!rails.length) return [];
    const targets = { straightness: context.targets.railStraightness, parallelism: context.targets.railParallelism, height: context.targets.railHeightDifference };
    const paired = pairs(rails);
    const ids = rails.map((r) => r.id);
    const [latest, perDatum] = await Promise.all([
      this.repo.latestSweeps(machine.workshopId, ids),
      paired.length ? this.repo.latestSweepsPerDatum(machine.workshopId, ids) : Promise.resolve([]),
    ]);
    const checks = rails.map((r) => this.straightnessCheck(r, latest.get(r.id) ?? null, targets.straightness));
    for (const [a, b] of paired) checks.push(this.parallelismCheck(a, b, comparedOf(a.id, latest, perDatum), comparedOf(b.id, latest, perDatum), targets));
    return checks;
  }

  /** GET /api/rails/:id/parallelism: this rail is A, its partner B. */
  async parallelismOf(actor: SessionUser, railId: string) {
    const rail = await this.rails.findRow(actor, railId);
    const machine = await this.machines.getRef(actor, rail.machineId);
    const targets = await this.targetsOf(actor.workshopId, machine.targetSetId);
    const shownTargets = { parallelism: plain(targets.parallelism), heightDifference: plain(targets.height) };
    const partner = rail.partnerRailId ? await this.repo.findRail(actor.workshopId, rail.partnerRailId) : null;
    if (!partner) {
      return { railId, partnerRailId: null, status: 'not-comparable' as const, reason: `Rail ${rail.label} has no partner rail`, targets: shownTargets };
    }
    const [latest, perDatum] = await Promise.all([
      this.repo.latestSweeps(actor.workshopId, [rail.id, partner.id]),
      this.repo.latestSweepsPerDatum(actor.workshopId, [rail.id, partner.id]),
    ]);
    const out = partnerParallelism(comparedOf(rail.id, latest, perDatum), comparedOf(partner.id, latest, perDatum), { a: rail.label, b: partner.label });
    const base = { railId, partnerRailId: partner.id, targets: shownTargets, sweeps: { a: out.a?.id ?? null, b: out.b?.id ?? null } };
    if (!out.comparable) return { ...base, status: 'not-comparable' as const, reason: out.reason, ...(out.unreadable ? { unreadable: UNREADABLE_INPUT } : {}) };
    const parallelWithin = out.parallelismMm <= targetInBaseUnit(targets.parallelism);
    const heightWithin = Math.abs(out.meanOffsetMm) <= targetInBaseUnit(targets.height);
    return {
      ...base,
      status: parallelWithin && heightWithin ? ('within-target' as const) : ('outside-target' as const),
      datum: out.datum,
      parallelism: out.parallelismMm,
      meanOffset: out.meanOffsetMm,
      positions: out.positionsMm,
      differences: out.differencesMm,
      parallelismWithin: parallelWithin,
      heightDifferenceWithin: heightWithin,
    };
  }

  private async targetsOf(workshopId: string, targetSetId: string) {
    const { targets } = await this.targetSets.findRow(workshopId, targetSetId);
    return { straightness: targets.railStraightness, parallelism: targets.railParallelism, height: targets.railHeightDifference };
  }

  private straightnessCheck(rail: RailRow, latest: LatestSweep | null, target: TargetValue): ReadinessCheck {
    const common = {
      key: `straightness:${rail.id}`,
      kind: 'rail-straightness' as const,
      // "Rail Y1 (left)" already names its axis; "Rail left" gets it added.
      subject: rail.label.includes(rail.axis) ? `Rail ${rail.label}` : `Rail ${rail.label} (${rail.axis})`,
      target: { ...plain(target), label: TARGET_LABELS.railStraightness },
      link: railLink(rail.machineId, rail.id),
    };
    if (!latest) return { ...common, status: 'not-started', result: null, recordType: null, recordId: null, recordedAt: null };
    if (!summaryReadable(latest)) {
      // A latest sweep that cannot be read blocks like a failed one and says why.
      return { ...common, subject: `${common.subject} (latest sweep unreadable)`, status: 'outside-target', result: null, recordType: 'rail-sweep', recordId: latest.id, recordedAt: latest.takenAt.toISOString() };
    }
    const ls = latest.leastSquaresStraightness;
    const mz = latest.minimumZoneStraightness;
    return {
      ...common,
      status: ls <= targetInBaseUnit(target) ? 'within-target' : 'outside-target',
      result: { value: inUnit(ls, target), unit: target.unit, summary: `Least squares ${show(ls, target)}, minimum zone ${show(mz, target)} (${latest.phase}, ${latest.stationCount} stations)` },
      recordType: 'rail-sweep',
      recordId: latest.id,
      recordedAt: latest.takenAt.toISOString(),
    };
  }

  private parallelismCheck(a: RailRow, b: RailRow, sa: ComparedSweep[], sb: ComparedSweep[], t: { parallelism: TargetValue; height: TargetValue }): ReadinessCheck {
    const out = partnerParallelism(sa, sb, { a: a.label, b: b.label });
    const common = {
      key: `parallelism:${a.id}:${b.id}`,
      kind: 'rail-parallelism' as const,
      subject: `Rails ${a.label} and ${b.label}`,
      target: { ...plain(t.parallelism), label: TARGET_LABELS.railParallelism },
      link: railLink(a.machineId, a.id),
    };
    if (!out.comparable && out.unreadable) {
      const bad = out.a!.takenAt >= out.b!.takenAt ? out.a! : out.b!;
      return { ...common, subject: `${common.subject} (latest sweep unreadable: ${out.reason})`, status: 'outside-target', result: null, recordType: 'rail-sweep', recordId: bad.id, recordedAt: bad.takenAt.toISOString() };
    }
    if (!out.comparable) {
      // No number to show yet; the reason goes with the subject so the board says what is missing.
      return { ...common, subject: `${common.subject} (${out.reason})`, status: 'not-started', result: null, recordType: null, recordId: null, recordedAt: null };
    }
    const parallelWithin = out.parallelismMm <= targetInBaseUnit(t.parallelism);
    const heightWithin = Math.abs(out.meanOffsetMm) <= targetInBaseUnit(t.height);
    const newer = out.a.takenAt >= out.b.takenAt ? out.a : out.b;
    return {
      ...common,
      status: parallelWithin && heightWithin ? 'within-target' : 'outside-target',
      result: {
        value: inUnit(out.parallelismMm, t.parallelism),
        unit: t.parallelism.unit,
        summary: `Parallelism ${show(out.parallelismMm, t.parallelism)} (target ${unitWord(t.parallelism)}); height difference ${show(out.meanOffsetMm, t.height)} (target ${unitWord(t.height)}${heightWithin ? '' : ', outside'}); datum ${out.datum}`,
      },
      recordType: 'rail-sweep',
      recordId: newer.id,
      recordedAt: newer.takenAt.toISOString(),
    };
  }
}

const plain = (t: TargetValue) => ({ value: t.value, unit: t.unit });
const unitWord = (t: TargetValue) => `${t.value} ${t.unit === 'um' ? 'µm' : t.unit}`;

/**
 * A rail's sweeps as the comparison needs them, newest first: its newest sweep per datum (with
 * readings), and its newest sweep overall only to say that it has one (no datum, no readings).
 */
function comparedOf(railId: string, latest: Map<string, LatestSweep>, perDatum: DatumSweep[]): ComparedSweep[] {
  const own: ComparedSweep[] = perDatum.filter((s) => s.railId === railId);
  const newest = latest.get(railId);
  if (newest && !own.some((s) => s.id === newest.id)) own.push({ id: newest.id, datum: null, takenAt: newest.takenAt, positionsMm: [], readingsMm: [] });
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
