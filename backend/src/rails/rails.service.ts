import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { MachinesService } from '../machines/machines.service.js';
import { RecordsService } from '../records/records.service.js';
import { EngineInputError } from '../engine/engine-input-error.js';
import { defaultEndDistanceMm, endDistanceProblem } from '../engine/rail-holes.js';
import { fromMm, toMm, type LengthUnit } from '../engine/units.js';
import { typicalBoltFor } from './bolt-torques.js';
import {
  railHoles,
  toRailResponse,
  toLatestSweepSummary,
  type RailListItem,
  type RailResponse,
} from './rail.mapper.js';
import { RailsRepository, type RailRow } from './rails.repository.js';
import type { CreateRailDto } from './dto/create-rail.dto.js';
import type { UpdateRailDto } from './dto/update-rail.dto.js';

/** A rail of a machine: its geometry (and so its holes) and its partner rail. */
@Injectable()
export class RailsService {
  constructor(
    private readonly repo: RailsRepository,
    private readonly machines: MachinesService,
    private readonly records: RecordsService,
  ) {}

  async list(actor: SessionUser, machineId: string): Promise<RailListItem[]> {
    await this.machines.getRef(actor, machineId);
    // The newest sweep of each rail and a count: the list costs the same at 10 or 10 000 sweeps.
    const { rails: rows, latest } = await this.repo.railsWithNewestSweeps(actor.workshopId, machineId);
    const counts = await this.repo.sweepCounts(
      actor.workshopId,
      rows.map((r) => r.id),
    );
    return rows.map((row) => {
      const newest = latest.get(row.id);
      return {
        ...toRailResponse(row),
        sweepCount: counts.get(row.id) ?? 0,
        latestSweep: newest ? toLatestSweepSummary(newest) : null,
      };
    });
  }

  async get(actor: SessionUser, id: string): Promise<RailResponse> {
    return toRailResponse(await this.findRow(actor, id));
  }

  /** The rail row of this workshop, or 404; other modules (the bolt-down guide) use it too. */
  async findRow(actor: SessionUser | { workshopId: string }, id: string): Promise<RailRow> {
    const row = await this.repo.findRail(actor.workshopId, id);
    if (!row) throw new NotFoundException('No such rail in this workshop');
    return row;
  }

  async create(actor: SessionUser, machineId: string, dto: CreateRailDto): Promise<RailResponse> {
    await this.machines.getRef(actor, machineId);
    const unit = dto.lengthUnit ?? 'mm';
    const g = railGeometryMm(dto, unit, null);
    checkGeometry(g, dto.profileSize ?? null, unit);
    if (dto.partnerRailId) await this.checkPartner(actor, machineId, null, dto.partnerRailId);
    const row = await this.repo.saveRail(
      actor.workshopId,
      null,
      {
        machineId,
        label: dto.label.trim(),
        axis: dto.axis.trim().toUpperCase(),
        profileSizeMm: dto.profileSize ?? null,
        lengthUnit: unit,
        ...g,
      },
      { set: !!dto.partnerRailId, partnerId: dto.partnerRailId ?? null },
    );
    await this.records.audit(actor, {
      machineId,
      recordType: 'rail',
      recordId: row.id,
      action: 'created',
      summary: `Rail ${row.label} (${row.axis}, ${showLength(row.lengthMm, unit)}) added`,
    });
    return toRailResponse(row);
  }

  async update(actor: SessionUser, id: string, dto: UpdateRailDto): Promise<RailResponse> {
    const before = await this.findRow(actor, id);
    const unit = dto.lengthUnit ?? before.lengthUnit;
    const g = railGeometryMm(dto, unit, before);
    const geometryTouched = ['length', 'holePitch', 'firstHole', 'endDistance', 'profileSize'].some(
      (k) => dto[k as keyof UpdateRailDto] !== undefined,
    );
    // A rail saved before end distances were kept may be renamed without first fixing its holes.
    if (geometryTouched) checkGeometry(g, dto.profileSize !== undefined ? dto.profileSize : before.profileSizeMm, unit);
    const partnerGiven = dto.partnerRailId !== undefined;
    if (dto.partnerRailId) await this.checkPartner(actor, before.machineId, id, dto.partnerRailId);
    const row = await this.repo.saveRail(
      actor.workshopId,
      id,
      {
        label: dto.label?.trim(),
        axis: dto.axis?.trim().toUpperCase(),
        profileSizeMm: dto.profileSize,
        lengthUnit: unit,
        ...g,
      },
      { set: partnerGiven, partnerId: dto.partnerRailId ?? null },
    );
    await this.records.audit(actor, {
      machineId: row.machineId,
      recordType: 'rail',
      recordId: id,
      action: 'updated',
      summary: `Rail ${row.label} changed`,
      changes: changes(before, row),
    });
    return toRailResponse(row);
  }

  async remove(actor: SessionUser, id: string): Promise<void> {
    const row = await this.findRow(actor, id);
    const ids = (await this.repo.sweepIds(actor.workshopId, id)).map((s) => s.id);
    const locked = await this.records.lockedIds('rail-sweep', ids);
    if (locked.size)
      await this.records.assertEditable('rail-sweep', [...locked][0], `Rail ${row.label} has a sweep that`);
    await this.repo.deleteRail(actor.workshopId, id);
    await this.records.audit(actor, {
      machineId: row.machineId,
      recordType: 'rail',
      recordId: id,
      action: 'deleted',
      summary: `Rail ${row.label} removed with its ${ids.length} sweep(s)`,
    });
  }

  private async checkPartner(actor: SessionUser, machineId: string, selfId: string | null, partnerId: string) {
    if (partnerId === selfId)
      throw new BadRequestException(['partnerRailId must be another rail, not the rail itself']);
    const partner = await this.repo.findRail(actor.workshopId, partnerId);
    if (!partner || partner.machineId !== machineId)
      throw new BadRequestException(['partnerRailId must be the id of another rail of this machine']);
  }
}

type Geometry = Pick<RailRow, 'lengthMm' | 'holePitchMm' | 'firstHoleMm' | 'spacingMm' | 'endDistanceMm'>;

/** The request's lengths in mm (each in `unit`), the stored ones where the request is silent. */
function railGeometryMm(dto: UpdateRailDto, unit: LengthUnit, before: RailRow | null): Geometry {
  const mm = (v: number | null | undefined, old: number | null) =>
    v === undefined ? old : v === null ? null : toMm(v, unit);
  return {
    lengthMm: mm(dto.length, before?.lengthMm ?? null)!,
    holePitchMm: mm(dto.holePitch, before?.holePitchMm ?? null)!,
    firstHoleMm: mm(dto.firstHole, before?.firstHoleMm ?? null)!,
    spacingMm: mm(dto.spacing, before?.spacingMm ?? null),
    endDistanceMm: mm(dto.endDistance, before?.endDistanceMm ?? null),
  };
}

const showLength = (mm: number, unit: LengthUnit) =>
  `${+fromMm(mm, unit).toPrecision(10)} ${unit === 'um' ? 'µm' : unit}`;

/** Bounds in mm, named by field with the value as sent, then the holes' end distance at both ends. */
function checkGeometry(g: Geometry, profileSize: number | null, unit: LengthUnit) {
  const problems: string[] = [];
  const within = (field: string, mm: number | null, lo: number, hi: number) => {
    if (mm === null) return;
    if (mm < lo || mm > hi)
      problems.push(
        `${field} must be between ${showLength(lo, unit)} and ${showLength(hi, unit)} (${showLength(mm, unit)} given)`,
      );
  };
  within('length', g.lengthMm, 10, 20_000);
  within('holePitch', g.holePitchMm, 5, 1000);
  within('spacing', g.spacingMm, 10, 20_000);
  within('endDistance', g.endDistanceMm, 0, 1000);
  if (g.firstHoleMm > g.lengthMm)
    problems.push(
      `firstHole must not be larger than length (${showLength(g.firstHoleMm, unit)} beyond a ${showLength(g.lengthMm, unit)} rail)`,
    );
  if (problems.length) throw new BadRequestException(problems);
  let holes: { position: number }[];
  try {
    holes = railHoles(g);
  } catch (e) {
    if (e instanceof EngineInputError) throw new BadRequestException([`holePitch: ${e.message}`]);
    throw e;
  }
  const endDistanceMm = g.endDistanceMm ?? defaultEndDistanceMm(typicalBoltFor(profileSize));
  const bad = endDistanceProblem(
    holes.map((h) => h.position),
    g.lengthMm,
    endDistanceMm,
  );
  if (bad) {
    const where =
      bad.clearanceMm <= 0
        ? bad.clearanceMm === 0
          ? 'sits on'
          : 'lies beyond'
        : `is ${showLength(bad.clearanceMm, unit)} from`;
    const field = bad.end === 'start' ? 'firstHole' : 'length';
    throw new BadRequestException([
      `${field}: the hole at ${showLength(bad.positionMm, unit)} ${where} the rail's ${bad.end === 'start' ? 'start' : 'far end'}; every hole centre needs at least ${showLength(endDistanceMm, unit)} (endDistance) from both ends — change firstHole, holePitch or length`,
    ]);
  }
}

function changes(before: RailRow, after: RailRow): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const key of [
    'label',
    'axis',
    'lengthUnit',
    'lengthMm',
    'profileSizeMm',
    'holePitchMm',
    'firstHoleMm',
    'spacingMm',
    'endDistanceMm',
    'partnerRailId',
  ] as const) {
    if (before[key] !== after[key]) out[key] = { from: before[key], to: after[key] };
  }
  return out;
}
