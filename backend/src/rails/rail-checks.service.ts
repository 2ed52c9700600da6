import { Injectable, OnModuleInit } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import type { TargetValue } from '../database/schema/target-sets.js';
import { fromMm, isLengthUnit } from '../engine/units.js';
import type { MachineRef, ReadinessCheck } from '../records/readiness.js';
import { ReadinessRegistry } from '../records/readiness.registry.js';
import { SubjectsRegistry } from '../records/subjects.registry.js';
import { TargetSetsService } from '../target-sets/target-sets.service.js';
import { TARGET_LABELS, targetInBaseUnit } from '../target-sets/target-keys.js';
import { MachinesService } from '../machines/machines.service.js';
import { partnerParallelism } from './rail-parallelism.js';
import { RailsRepository, type RailRow, type SweepRow } from './rails.repository.js';
import { RailsService } from './rails.service.js';

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
    this.readiness.register({ checksFor: (m) => this.checksFor(m) });
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

  async checksFor(machine: MachineRef): Promise<ReadinessCheck[]> {
    const rails = await this.repo.listRails(machine.workshopId, machine.id);
    if (!rails.length) return [];
    const sweeps = await this.repo.sweepsOfRails(machine.workshopId, rails.map((r) => r.id));
    const targets = await this.targetsOf(machine.workshopId, machine.targetSetId);
    const of = (id: string) => sweeps.filter((s) => s.railId === id);
    const checks = rails.map((r) => this.straightnessCheck(r, of(r.id)[0] ?? null, targets.straightness));
    for (const [a, b] of pairs(rails)) checks.push(this.parallelismCheck(a, b, of(a.id), of(b.id), targets));
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
    const [sa, sb] = await Promise.all([this.repo.listSweeps(actor.workshopId, rail.id), this.repo.listSweeps(actor.workshopId, partner.id)]);
    const out = partnerParallelism(sa, sb, { a: rail.label, b: partner.label });
    const base = { railId, partnerRailId: partner.id, targets: shownTargets, sweeps: { a: out.a?.id ?? null, b: out.b?.id ?? null } };
    if (!out.comparable) return { ...base, status: 'not-comparable' as const, reason: out.reason };
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
    const [s, p, h] = await Promise.all([
      this.targetSets.targetFor(workshopId, targetSetId, 'railStraightness'),
      this.targetSets.targetFor(workshopId, targetSetId, 'railParallelism'),
      this.targetSets.targetFor(workshopId, targetSetId, 'railHeightDifference'),
    ]);
    return { straightness: s.target, parallelism: p.target, height: h.target };
  }

  private straightnessCheck(rail: RailRow, latest: SweepRow | null, target: TargetValue): ReadinessCheck {
    const common = {
      key: `straightness:${rail.id}`,
      kind: 'rail-straightness' as const,
      // "Rail Y1 (left)" already names its axis; "Rail left" gets it added.
      subject: rail.label.includes(rail.axis) ? `Rail ${rail.label}` : `Rail ${rail.label} (${rail.axis})`,
      target: { ...plain(target), label: TARGET_LABELS.railStraightness },
      link: railLink(rail.machineId, rail.id),
    };
    if (!latest) return { ...common, status: 'not-started', result: null, recordType: null, recordId: null, recordedAt: null };
    const ls = latest.result.leastSquares.straightness;
    const mz = latest.result.minimumZone.straightness;
    return {
      ...common,
      status: ls <= targetInBaseUnit(target) ? 'within-target' : 'outside-target',
      result: { value: inUnit(ls, target), unit: target.unit, summary: `Least squares ${show(ls, target)}, minimum zone ${show(mz, target)} (${latest.phase}, ${latest.positionsMm.length} stations)` },
      recordType: 'rail-sweep',
      recordId: latest.id,
      recordedAt: latest.takenAt.toISOString(),
    };
  }

  private parallelismCheck(a: RailRow, b: RailRow, sa: SweepRow[], sb: SweepRow[], t: { parallelism: TargetValue; height: TargetValue }): ReadinessCheck {
    const out = partnerParallelism(sa, sb, { a: a.label, b: b.label });
    const common = {
      key: `parallelism:${a.id}:${b.id}`,
      kind: 'rail-parallelism' as const,
      subject: `Rails ${a.label} and ${b.label}`,
      target: { ...plain(t.parallelism), label: TARGET_LABELS.railParallelism },
      link: railLink(a.machineId, a.id),
    };
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
