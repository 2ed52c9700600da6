import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { MachinesService } from '../machines/machines.service.js';
import { RecordsService } from '../records/records.service.js';
import { EngineInputError } from '../engine/engine-input-error.js';
import { railHoles, toRailResponse, toLatestSweepSummary, type RailListItem, type RailResponse } from './rail.mapper.js';
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
    const rows = await this.repo.listRails(actor.workshopId, machineId);
    const ids = rows.map((r) => r.id);
    // The newest sweep of each rail and a count: the list costs the same at 10 or 10 000 sweeps.
    const [latest, counts] = await Promise.all([this.repo.latestSweeps(actor.workshopId, ids), this.repo.sweepCounts(actor.workshopId, ids)]);
    return rows.map((row) => {
      const newest = latest.get(row.id);
      return { ...toRailResponse(row), sweepCount: counts.get(row.id) ?? 0, latestSweep: newest ? toLatestSweepSummary(newest) : null };
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
    checkGeometry(dto.lengthMm, dto.holePitchMm, dto.firstHoleMm);
    if (dto.partnerRailId) await this.checkPartner(actor, machineId, null, dto.partnerRailId);
    const row = await this.repo.saveRail(
      actor.workshopId,
      null,
      {
        machineId,
        label: dto.label.trim(),
        axis: dto.axis.trim().toUpperCase(),
        lengthMm: dto.lengthMm,
        profileSizeMm: dto.profileSize ?? null,
        holePitchMm: dto.holePitchMm,
        firstHoleMm: dto.firstHoleMm,
      },
      { set: !!dto.partnerRailId, partnerId: dto.partnerRailId ?? null },
    );
    await this.records.audit(actor, { machineId, recordType: 'rail', recordId: row.id, action: 'created', summary: `Rail ${row.label} (${row.axis}, ${row.lengthMm} mm) added` });
    return toRailResponse(row);
  }

  async update(actor: SessionUser, id: string, dto: UpdateRailDto): Promise<RailResponse> {
    const before = await this.findRow(actor, id);
    const next = { lengthMm: dto.lengthMm ?? before.lengthMm, holePitchMm: dto.holePitchMm ?? before.holePitchMm, firstHoleMm: dto.firstHoleMm ?? before.firstHoleMm };
    checkGeometry(next.lengthMm, next.holePitchMm, next.firstHoleMm);
    const partnerGiven = dto.partnerRailId !== undefined;
    if (dto.partnerRailId) await this.checkPartner(actor, before.machineId, id, dto.partnerRailId);
    const row = await this.repo.saveRail(
      actor.workshopId,
      id,
      {
        label: dto.label?.trim(),
        axis: dto.axis?.trim().toUpperCase(),
        lengthMm: dto.lengthMm,
        profileSizeMm: dto.profileSize,
        holePitchMm: dto.holePitchMm,
        firstHoleMm: dto.firstHoleMm,
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
    if (locked.size) await this.records.assertEditable('rail-sweep', [...locked][0], `Rail ${row.label} has a sweep that`);
    await this.repo.deleteRail(actor.workshopId, id);
    await this.records.audit(actor, { machineId: row.machineId, recordType: 'rail', recordId: id, action: 'deleted', summary: `Rail ${row.label} removed with its ${ids.length} sweep(s)` });
  }

  private async checkPartner(actor: SessionUser, machineId: string, selfId: string | null, partnerId: string) {
    if (partnerId === selfId) throw new BadRequestException(['partnerRailId must be another rail, not the rail itself']);
    const partner = await this.repo.findRail(actor.workshopId, partnerId);
    if (!partner || partner.machineId !== machineId) throw new BadRequestException(['partnerRailId must be the id of another rail of this machine']);
  }
}

function checkGeometry(lengthMm: number, holePitchMm: number, firstHoleMm: number) {
  if (firstHoleMm > lengthMm) throw new BadRequestException(['firstHoleMm must not be larger than lengthMm']);
  try {
    railHoles({ lengthMm, holePitchMm, firstHoleMm });
  } catch (e) {
    if (e instanceof EngineInputError) throw new BadRequestException([`holePitchMm: ${e.message}`]);
    throw e;
  }
}

function changes(before: RailRow, after: RailRow): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const key of ['label', 'axis', 'lengthMm', 'profileSizeMm', 'holePitchMm', 'firstHoleMm', 'partnerRailId'] as const) {
    if (before[key] !== after[key]) out[key] = { from: before[key], to: after[key] };
  }
  return out;
}
