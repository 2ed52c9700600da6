import { BadRequestException, ConflictException, Injectable, NotFoundException, OnModuleInit } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { holePositions } from '../engine/bolt-down.js';
import { endDistanceProblem } from '../engine/rail-holes.js';
import { railEndDistanceMm } from '../rails/rail.mapper.js';
import { fromMm, toMm, type LengthUnit } from '../engine/units.js';
import { MachinesService, refuseWhileApproved } from '../machines/machines.service.js';
import { RailSweepsService } from '../rails/rail-sweeps.service.js';
import { RailsService } from '../rails/rails.service.js';
import type { RailRow } from '../rails/rails.repository.js';
import type { SweepResponse } from '../rails/rail.mapper.js';
import { lockedRecordConflict, RecordsService, type AuditInput } from '../records/records.service.js';
import { SubjectsRegistry } from '../records/subjects.registry.js';
import { TargetSetsService } from '../target-sets/target-sets.service.js';
import { sessionOf, toBoltDownResponse, type BoltDownResponse, type HoleWriteResponse } from './bolt-down.mapper.js';
import { BoltDownsRepository, type BoltDownRow } from './bolt-downs.repository.js';
import type { AbandonBoltDownDto } from './dto/abandon-bolt-down.dto.js';
import type { CreateBoltDownDto } from './dto/create-bolt-down.dto.js';
import type { FinalSweepDto } from './dto/final-sweep.dto.js';
import type { RecordHoleDto } from './dto/record-hole.dto.js';

const RECORD_TYPE = 'bolt-down';
/** A hole-by-hole guide beyond this many holes is not a rail anyone bolts down by hand. */
export const MAX_HOLES = 1000;
/** Largest reading a dial indicator gives, in mm; beyond it the reading is a typing slip. */
const MAX_READING_MM = 100;
// Positions of a final-sweep station and its hole may differ by rounding only.
const STATION_SLACK_MM = 1e-6;

/** The bolt-down guide: a rail fixed hole by hole, its progress kept on the server. */
@Injectable()
export class BoltDownsService implements OnModuleInit {
  constructor(
    private readonly repo: BoltDownsRepository,
    private readonly rails: RailsService,
    private readonly sweeps: RailSweepsService,
    private readonly machines: MachinesService,
    private readonly targetSets: TargetSetsService,
    private readonly records: RecordsService,
    private readonly subjects: SubjectsRegistry,
  ) {}

  onModuleInit() {
    this.subjects.register(RECORD_TYPE, async (workshopId, id) => {
      const row = await this.repo.find(workshopId, id);
      if (!row) return null;
      const rail = await this.rails.findRow({ workshopId }, row.railId);
      return {
        machineId: row.machineId,
        recordType: RECORD_TYPE,
        recordId: id,
        label: `Bolt-down of rail ${rail.label}`,
      };
    });
  }

  async start(actor: SessionUser, railId: string, dto: CreateBoltDownDto): Promise<BoltDownResponse> {
    const rail = await this.rails.findRow(actor, railId);
    const unit: LengthUnit = dto.readingUnit ?? 'mm';
    const lengthUnit: LengthUnit = dto.lengthUnit ?? rail.lengthUnit;
    const positions = holePositions({
      lengthMm: rail.lengthMm,
      pitchMm: rail.holePitchMm,
      firstHoleOffsetMm: rail.firstHoleMm,
    });
    const endDistanceMm = railEndDistanceMm(rail);
    const bad = endDistanceProblem(positions, rail.lengthMm, endDistanceMm);
    if (bad) {
      throw new BadRequestException([
        `railId: rail ${rail.label} has a hole at ${+fromMm(bad.positionMm, lengthUnit).toPrecision(10)} ${lengthUnit} ${bad.clearanceMm <= 0 ? 'on or beyond' : 'too near'} its ${bad.end === 'start' ? 'start' : 'far end'} (each hole centre needs ${+fromMm(endDistanceMm, lengthUnit).toPrecision(6)} ${lengthUnit} from both ends); correct the rail's firstHole, holePitch or length first`,
      ]);
    }
    if (positions.length > MAX_HOLES)
      throw new BadRequestException([`the rail has ${positions.length} holes; the guide takes at most ${MAX_HOLES}`]);
    const bandMm = dto.band !== undefined ? toMm(dto.band, unit) : await this.defaultBandMm(actor, rail);
    const row = await this.repo.insert({
      workshopId: actor.workshopId,
      machineId: rail.machineId,
      railId,
      mode: dto.mode,
      readingUnit: unit,
      lengthUnit,
      holePositionsMm: positions,
      bandMm,
      createdById: actor.id,
      createdByName: actor.name,
    });
    await this.records.audit(actor, {
      machineId: rail.machineId,
      recordType: RECORD_TYPE,
      recordId: row.id,
      action: 'created',
      summary: `Bolt-down of rail ${rail.label} begun (${dto.mode} mode, ${positions.length} holes, readings in ${unit})`,
    });
    return toBoltDownResponse(row, [], railInfo(rail));
  }

  async listForRail(actor: SessionUser, railId: string): Promise<BoltDownResponse[]> {
    const rail = await this.rails.findRow(actor, railId);
    const rows = await this.repo.listForRail(actor.workshopId, railId);
    const holes = await this.repo.holesOf(
      actor.workshopId,
      rows.map((r) => r.id),
    );
    return rows.map((r) => toBoltDownResponse(r, holes.get(r.id)!, railInfo(rail)));
  }

  async get(actor: SessionUser, id: string): Promise<BoltDownResponse> {
    const { row, rail } = await this.load(actor, id);
    return this.respond(actor, row, rail);
  }

  /**
   * Records a reading (and whether the hole is now fixed); a repeated writeId changes nothing.
   * One read of the bolt-down, the machine locked, one read of its holes, one write, one audit:
   * the answer is built from what was written.
   */
  async recordHole(actor: SessionUser, id: string, indexParam: string, dto: RecordHoleDto): Promise<HoleWriteResponse> {
    const found = await this.repo.findForHoleWrite(actor.workshopId, id, dto.writeId);
    if (!found) throw new NotFoundException('No such bolt-down in this workshop');
    const { row, rail, seen } = found;
    const holeIndex = parseIndex(indexParam, row.holePositionsMm.length);
    const readingMm = toMm(dto.reading, row.readingUnit);
    if (Math.abs(readingMm) > MAX_READING_MM)
      throw new BadRequestException([
        `reading must be within ±${fromMm(MAX_READING_MM, row.readingUnit)} ${row.readingUnit}`,
      ]);
    // A repeat of a write already applied answers the same, even once the bolt-down is finished.
    if (seen) {
      if (seen.workshopId !== actor.workshopId || seen.boltDownId !== id || seen.target !== `hole:${holeIndex}`) {
        throw new ConflictException('writeId was already used for another write; make a new one for each write');
      }
      return { ...(await this.respond(actor, row, rail)), writeId: dto.writeId, repeated: true };
    }
    // The machine's row was locked by the read above, before any write.
    refuseWhileApproved(found.machine);
    if (row.finalSweepId) throw finishedConflict();
    if (row.abandonedAt) throw abandonedConflict(row);
    if (found.locked) throw lockedRecordConflict('This bolt-down');

    // Read after the lock, so no other writer of this machine can change them before this write.
    const holes = (await this.repo.holesOf(actor.workshopId, [id])).get(id)!;
    const before = holes.find((h) => h.holeIndex === holeIndex) ?? null;
    const target = sessionOf(row, holes).holes[holeIndex].targetMm;
    const fmt = (mm: number | null) =>
      mm === null ? 'none yet' : `${signed(fromMm(mm, row.readingUnit))} ${row.readingUnit}`;
    const at = `hole ${holeIndex + 1} at ${+fromMm(row.holePositionsMm[holeIndex], row.lengthUnit).toPrecision(10)} ${row.lengthUnit}`;
    const summary = dto.fixed
      ? `Rail ${rail.label}: ${at} fixed at ${signed(dto.reading)} ${row.readingUnit} (aim ${fmt(target)})`
      : before?.fixed
        ? `Rail ${rail.label}: ${at} loosened again (reading ${signed(dto.reading)} ${row.readingUnit})`
        : `Rail ${rail.label}: reading ${signed(dto.reading)} ${row.readingUnit} typed at ${at}`;
    const entry: AuditInput & { machineId: string } = {
      machineId: row.machineId,
      recordType: RECORD_TYPE,
      recordId: id,
      action: 'updated',
      summary,
      changes: { hole: holeIndex, reading: dto.reading, unit: row.readingUnit, fixed: dto.fixed, writeId: dto.writeId },
    };
    const outcome = await this.repo.writeHole(
      actor.workshopId,
      id,
      {
        writeId: dto.writeId,
        holeIndex,
        readingRaw: dto.reading,
        readingMm,
        fixed: dto.fixed,
        actor,
        before,
        now: new Date(),
      },
      this.records.auditAlong(actor, entry, 'h'),
    );
    if (outcome.kind === 'id-taken')
      throw new ConflictException('writeId was already used for another write; make a new one for each write');
    if (outcome.kind === 'finished') {
      const now = await this.repo.find(actor.workshopId, id);
      throw now?.abandonedAt ? abandonedConflict(now) : finishedConflict();
    }
    if (outcome.kind === 'repeat')
      return { ...(await this.respond(actor, row, rail)), writeId: dto.writeId, repeated: true };

    await this.records.auditedAlong(actor, entry);
    const written = [...holes.filter((h) => h.holeIndex !== holeIndex), outcome.hole].sort(
      (a, b) => a.holeIndex - b.holeIndex,
    );
    const fresh = { ...row, fixCounter: outcome.fixCounter, updatedAt: outcome.hole.updatedAt };
    return { ...toBoltDownResponse(fresh, written, railInfo(rail)), writeId: dto.writeId, repeated: false };
  }

  /**
   * Saves the sweep taken at every hole once every hole is fixed, through the rails module so its
   * result and status are the engine's like any other sweep. The sweep id (dto.id) makes a retry
   * the same save.
   */
  async recordFinalSweep(
    actor: SessionUser,
    id: string,
    dto: FinalSweepDto,
  ): Promise<{ created: boolean; boltDown: BoltDownResponse; sweep: SweepResponse }> {
    const { row, rail } = await this.load(actor, id);
    await this.machines.lockForChange(actor, row.machineId);
    if (row.finalSweepId) {
      if (dto.id && dto.id === row.finalSweepId) {
        return {
          created: false,
          boltDown: await this.respond(actor, row, rail),
          sweep: await this.sweeps.get(actor, row.finalSweepId),
        };
      }
      throw new ConflictException('This bolt-down already has its final sweep');
    }
    if (row.abandonedAt) throw abandonedConflict(row);
    const session = sessionOf(row, (await this.repo.holesOf(actor.workshopId, [id])).get(id)!);
    if (!session.complete) {
      throw new ConflictException(
        `Fix every hole before the final sweep: ${session.fixedCount} of ${row.holePositionsMm.length} holes are fixed`,
      );
    }
    checkStationsAtHoles(dto, row.holePositionsMm);
    const { created, sweep } = await this.sweeps.record(actor, row.railId, dto);
    const linked = await this.repo.linkFinalSweep(actor.workshopId, id, sweep.id);
    if (linked !== sweep.id) {
      const now = await this.repo.find(actor.workshopId, id);
      throw now?.abandonedAt
        ? abandonedConflict(now)
        : new ConflictException('This bolt-down already has its final sweep');
    }
    if (created) {
      await this.records.audit(actor, {
        machineId: row.machineId,
        recordType: RECORD_TYPE,
        recordId: id,
        action: 'updated',
        summary: `Bolt-down of rail ${rail.label} finished with a final sweep at every hole (${sweep.status === 'within-target' ? 'within' : 'outside'} target)`,
        changes: { finalSweepId: sweep.id },
      });
    }
    const fresh = await this.repo.find(actor.workshopId, id);
    return { created, boltDown: await this.respond(actor, fresh!, rail), sweep };
  }

  /**
   * Gives up a bolt-down that is not finished, with the reason: kept with it, audited in the same
   * transaction, and a new bolt-down of the rail can then begin. Refused while an approval stands.
   */
  async abandon(actor: SessionUser, id: string, dto: AbandonBoltDownDto): Promise<BoltDownResponse> {
    const { row, rail } = await this.load(actor, id);
    await this.machines.lockForChange(actor, row.machineId);
    await this.records.assertEditable(RECORD_TYPE, id, 'This bolt-down');
    const current = (await this.repo.find(actor.workshopId, id))!;
    if (current.abandonedAt) throw abandonedConflict(current);
    if (current.finalSweepId)
      throw new ConflictException('This bolt-down is finished and has its final sweep; it cannot be abandoned');
    const written = await this.repo.abandon(actor.workshopId, id, {
      reason: dto.reason,
      name: actor.name,
      at: new Date(),
    });
    if (!written) throw new ConflictException('This bolt-down was finished or abandoned meanwhile; reload to see it');
    const holes = (await this.repo.holesOf(actor.workshopId, [id])).get(id)!;
    await this.records.audit(actor, {
      machineId: row.machineId,
      recordType: RECORD_TYPE,
      recordId: id,
      action: 'updated',
      summary: `Bolt-down of rail ${rail.label} abandoned with ${holes.filter((h) => h.fixed).length} of ${row.holePositionsMm.length} holes fixed: ${dto.reason}`,
      changes: { abandoned: true, reason: dto.reason },
    });
    return toBoltDownResponse(written, holes, railInfo(rail));
  }

  private async load(actor: SessionUser, id: string): Promise<{ row: BoltDownRow; rail: RailRow }> {
    const row = await this.repo.find(actor.workshopId, id);
    if (!row) throw new NotFoundException('No such bolt-down in this workshop');
    return { row, rail: await this.rails.findRow(actor, row.railId) };
  }

  private async respond(actor: SessionUser, row: BoltDownRow, rail: RailInfo): Promise<BoltDownResponse> {
    const holes = await this.repo.holesOf(actor.workshopId, [row.id]);
    return toBoltDownResponse(row, holes.get(row.id)!, railInfo(rail));
  }

  /** Half the rail straightness target: holes within ± that of the aim keep the rail inside it. */
  private async defaultBandMm(actor: SessionUser, rail: RailRow): Promise<number> {
    const machine = await this.machines.getRef(actor, rail.machineId);
    const { base } = await this.targetSets.targetFor(actor.workshopId, machine.targetSetId, 'railStraightness');
    return base / 2;
  }
}

type RailInfo = Pick<RailRow, 'label' | 'axis' | 'lengthMm'>;

const finishedConflict = () =>
  new ConflictException(
    'This bolt-down is finished and has its final sweep; begin a new bolt-down to re-align the rail',
  );

const abandonedConflict = (row: BoltDownRow) =>
  new ConflictException(
    `This bolt-down was abandoned${row.abandonedByName ? ` by ${row.abandonedByName}` : ''} (${row.abandonedReason ?? 'no reason given'}); begin a new bolt-down to align the rail`,
  );

function railInfo(rail: RailInfo) {
  return { label: rail.label, axis: rail.axis, lengthMm: rail.lengthMm };
}

function parseIndex(raw: string, count: number): number {
  const index = /^\d+$/.test(raw) ? Number(raw) : NaN;
  if (!Number.isInteger(index) || index >= count) {
    throw new BadRequestException([`index must be a hole of this rail: a whole number from 0 to ${count - 1}`]);
  }
  return index;
}

function checkStationsAtHoles(dto: FinalSweepDto, positionsMm: number[]) {
  const unit = dto.lengthUnit ?? 'mm';
  const stationsMm = dto.stations.map((s) => toMm(s.position, unit));
  const missing = positionsMm.filter((p) => !stationsMm.some((s) => Math.abs(s - p) <= STATION_SLACK_MM));
  const extra = dto.stations.filter(
    (_, i) => !positionsMm.some((p) => Math.abs(stationsMm[i] - p) <= STATION_SLACK_MM),
  );
  const show = (mm: number) => +fromMm(mm, unit).toPrecision(10);
  const problems: string[] = [];
  if (missing.length)
    problems.push(
      `stations must include every hole: missing ${missing.slice(0, 5).map(show).join(', ')} ${unit}${missing.length > 5 ? ' …' : ''}`,
    );
  if (extra.length)
    problems.push(
      `stations must be at the holes only: ${extra
        .slice(0, 5)
        .map((s) => s.position)
        .join(', ')} ${unit} is not a hole`,
    );
  if (problems.length) throw new BadRequestException(problems);
}

function signed(v: number): string {
  const r = Number(v.toPrecision(6));
  return r > 0 ? `+${r}` : `${r}`;
}
