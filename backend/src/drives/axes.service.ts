import { BadRequestException, ConflictException, Injectable, NotFoundException, OnModuleInit } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import type { StepsChange } from '../database/schema/drives.js';
import { evaluateDrive } from '../engine/steps-per-mm.js';
import { toMm, type LengthUnit } from '../engine/units.js';
import { MachinesService } from '../machines/machines.service.js';
import { RecordsService } from '../records/records.service.js';
import { SubjectsRegistry } from '../records/subjects.registry.js';
import { AxesRepository, type AxisInsert, type AxisRow } from './axes.repository.js';
import { AxisChecksRepository } from './axis-checks.repository.js';
import { toAxisResponse, type AxisResponse } from './axis.mapper.js';
import { toDriveRecord, toEngineDrive } from './drive-record.js';
import type { CreateAxisDto } from './dto/create-axis.dto.js';
import type { UpdateAxisDto } from './dto/update-axis.dto.js';

type AxisSaved = (actor: SessionUser, row: AxisRow, before: AxisRow | null) => Promise<void>;

/** Axes of a machine and their drive records: access, validation, steps-per-mm history. */
@Injectable()
export class AxesService implements OnModuleInit {
  private readonly saved: AxisSaved[] = [];

  constructor(
    private readonly repo: AxesRepository,
    private readonly checks: AxisChecksRepository,
    private readonly machines: MachinesService,
    private readonly records: RecordsService,
    private readonly subjects: SubjectsRegistry,
  ) {}

  onModuleInit() {
    this.subjects.register('axis', async (workshopId, id) => {
      const row = await this.repo.find(workshopId, id);
      return row ? { machineId: row.machineId, recordType: 'axis', recordId: id, label: `Axis ${row.name}` } : null;
    });
  }

  /** Lets the drive checks record the speed check and travel envelope a saved drive record gives. */
  onAxisSaved(listener: AxisSaved): void {
    this.saved.push(listener);
  }

  private async notifySaved(actor: SessionUser, row: AxisRow, before: AxisRow | null) {
    for (const listener of this.saved) await listener(actor, row, before);
  }

  async listRows(actor: SessionUser | { workshopId: string }, machineId: string): Promise<AxisRow[]> {
    return this.repo.list(actor.workshopId, machineId);
  }

  async get(actor: SessionUser, id: string): Promise<AxisResponse> {
    return this.respond(await this.findRow(actor, id));
  }

  async respond(row: AxisRow): Promise<AxisResponse> {
    const locked = await this.records.lockedIds('axis', [row.id]);
    return toAxisResponse(row, locked.has(row.id));
  }

  async respondMany(rows: AxisRow[]): Promise<AxisResponse[]> {
    const locked = await this.records.lockedIds(
      'axis',
      rows.map((r) => r.id),
    );
    return rows.map((r) => toAxisResponse(r, locked.has(r.id)));
  }

  /** The axis row of this workshop, or 404. */
  async findRow(actor: SessionUser | { workshopId: string }, id: string): Promise<AxisRow> {
    const row = await this.repo.find(actor.workshopId, id);
    if (!row) throw new NotFoundException('No such axis in this workshop');
    return row;
  }

  async create(actor: SessionUser, machineId: string, dto: CreateAxisDto): Promise<AxisResponse> {
    await this.machines.getRef(actor, machineId);
    const unit = dto.lengthUnit ?? 'mm';
    const values: AxisInsert = {
      workshopId: actor.workshopId,
      machineId,
      name: dto.name.trim(),
      lengthUnit: unit,
      drive: toDriveRecord(dto.drive, unit),
      motorStepsPerRev: dto.motorStepsPerRev,
      microsteps: dto.microsteps,
      gearRatio: dto.gearRatio ?? 1,
      stepsPerMm: dto.stepsPerMm,
      maxFeedRateMmPerMin: dto.maxFeedRate == null ? null : toMm(dto.maxFeedRate, unit),
      measuredTravelMm: travelMm(dto.measuredTravel, dto.measuredTravelMm, unit) ?? null,
      notes: dto.notes ?? '',
    };
    checkNumbers(values);
    await this.assertNameFree(actor, machineId, values.name, null);
    const row = await this.repo.insert(values);
    await this.records.audit(actor, {
      machineId,
      recordType: 'axis',
      recordId: row.id,
      action: 'created',
      summary: `Axis ${row.name} added (${row.drive.type} drive, ${row.stepsPerMm} steps/mm in use)`,
    });
    await this.notifySaved(actor, row, null);
    return this.respond(row);
  }

  async update(actor: SessionUser, id: string, dto: UpdateAxisDto): Promise<AxisResponse> {
    const before = await this.findRow(actor, id);
    await this.records.assertEditable('axis', id, `Axis ${before.name}`);
    // Lengths sent are in the unit sent, else in the axis's own; changing the unit alone keeps every length.
    const unit = (dto.lengthUnit ?? before.lengthUnit) as LengthUnit;
    const travel = travelMm(dto.measuredTravel, dto.measuredTravelMm, unit);
    const next: AxisInsert = {
      ...before,
      name: dto.name?.trim() ?? before.name,
      lengthUnit: unit,
      drive: dto.drive ? toDriveRecord(dto.drive, unit) : before.drive,
      motorStepsPerRev: dto.motorStepsPerRev ?? before.motorStepsPerRev,
      microsteps: dto.microsteps ?? before.microsteps,
      gearRatio: dto.gearRatio ?? before.gearRatio,
      stepsPerMm: dto.stepsPerMm ?? before.stepsPerMm,
      maxFeedRateMmPerMin:
        dto.maxFeedRate === undefined
          ? before.maxFeedRateMmPerMin
          : dto.maxFeedRate === null
            ? null
            : toMm(dto.maxFeedRate, unit),
      measuredTravelMm: travel === undefined ? before.measuredTravelMm : travel,
      notes: dto.notes ?? before.notes,
    };
    checkNumbers(next);
    if (next.name.toLowerCase() !== before.name.toLowerCase())
      await this.assertNameFree(actor, before.machineId, next.name, id);
    const stepsHistory =
      next.stepsPerMm !== before.stepsPerMm
        ? [...before.stepsHistory, change(actor, before.stepsPerMm, next.stepsPerMm, 'edited')]
        : before.stepsHistory;
    const { id: _id, workshopId: _w, machineId: _m, createdAt: _c, updatedAt: _u, ...fields } = next as AxisRow;
    const row = await this.repo.update(actor.workshopId, id, { ...fields, stepsHistory });
    await this.records.audit(actor, {
      machineId: row.machineId,
      recordType: 'axis',
      recordId: id,
      action: 'updated',
      summary: `Axis ${row.name} changed`,
      changes: diff(before, row),
    });
    await this.notifySaved(actor, row, before);
    return this.respond(row);
  }

  /**
   * Stores a corrected steps per mm from a travel trial; the old value goes into the history.
   * Allowed on a locked axis: the lock keeps the drive record the speed check and the travel
   * envelope were judged on, and a recalibration after approval must stay possible (and audited).
   */
  async applyStepsPerMm(
    actor: SessionUser,
    axis: AxisRow,
    value: number,
    trialId: string,
    confirmedFromTheoryPercent: number | null = null,
  ): Promise<AxisRow> {
    const stepsHistory = [...axis.stepsHistory, change(actor, axis.stepsPerMm, value, 'travel-trial', trialId)];
    const row = await this.repo.update(actor.workshopId, axis.id, { stepsPerMm: value, stepsHistory });
    await this.records.audit(actor, {
      machineId: axis.machineId,
      recordType: 'axis',
      recordId: axis.id,
      action: 'updated',
      summary: `Axis ${axis.name}: steps per mm ${axis.stepsPerMm} → ${value} from a travel trial${confirmedFromTheoryPercent === null ? '' : ` (${confirmedFromTheoryPercent.toFixed(1)} % from the theoretical value, confirmed)`}`,
      changes: { stepsPerMm: { from: axis.stepsPerMm, to: value }, travelTrialId: trialId },
    });
    return row;
  }

  async delete(actor: SessionUser, id: string): Promise<void> {
    const row = await this.findRow(actor, id);
    await this.records.assertEditable('axis', id, `Axis ${row.name}`);
    const { trialIds, runIds } = await this.checks.idsOfAxis(actor.workshopId, id);
    const [lockedTrials, lockedRuns] = await Promise.all([
      this.records.lockedIds('travel-trial', trialIds),
      this.records.lockedIds('positioning-run', runIds),
    ]);
    if (lockedTrials.size || lockedRuns.size) {
      throw new ConflictException(
        `Axis ${row.name} has checks that are part of an approved commissioning record; it can no longer be deleted.`,
      );
    }
    await this.repo.delete(actor.workshopId, id);
    await this.records.audit(actor, {
      machineId: row.machineId,
      recordType: 'axis',
      recordId: id,
      action: 'deleted',
      summary: `Axis ${row.name} removed with ${trialIds.length} travel trial(s) and ${runIds.length} repeat-and-reverse run(s)`,
    });
  }

  private async assertNameFree(actor: SessionUser, machineId: string, name: string, exceptId: string | null) {
    const taken = (await this.repo.list(actor.workshopId, machineId)).some(
      (a) => a.id !== exceptId && a.name.toLowerCase() === name.toLowerCase(),
    );
    if (taken) throw new ConflictException(`This machine already has an axis named ${name}`);
  }
}

/** The measured travel in mm from `measuredTravel` (in the axis's unit) or `measuredTravelMm`; undefined when neither is sent. */
function travelMm(
  inUnit: number | null | undefined,
  mm: number | null | undefined,
  unit: LengthUnit,
): number | null | undefined {
  if (inUnit !== undefined && mm !== undefined)
    throw new BadRequestException([
      'measuredTravel and measuredTravelMm give the same thing: send one of them (measuredTravel is in lengthUnit)',
    ]);
  const [field, value] = inUnit !== undefined ? ['measuredTravel', inUnit] : ['measuredTravelMm', mm];
  if (value !== undefined && value !== null && !(value > 0))
    throw new BadRequestException([`${field} must be greater than zero`]);
  if (inUnit !== undefined) return inUnit === null ? null : toMm(inUnit, unit);
  return mm;
}

/** Range rules the DTO cannot express; the engine checks the drive itself (and names the field). */
function checkNumbers(v: AxisInsert): void {
  const problems: string[] = [];
  if (!(v.stepsPerMm > 0)) problems.push('stepsPerMm must be greater than zero');
  if (v.maxFeedRateMmPerMin != null && !(v.maxFeedRateMmPerMin > 0))
    problems.push('maxFeedRate must be greater than zero (lengthUnit per minute)');
  if (v.measuredTravelMm != null && !(v.measuredTravelMm > 0))
    problems.push('measuredTravel must be greater than zero');
  if (!Number.isInteger(v.motorStepsPerRev) || v.motorStepsPerRev <= 0)
    problems.push('motorStepsPerRev must be a whole number greater than zero');
  if (!(v.microsteps > 0)) problems.push('microsteps must be greater than zero');
  if (v.gearRatio != null && !(v.gearRatio > 0)) problems.push('gearRatio must be greater than zero');
  if (problems.length) throw new BadRequestException(problems);
  evaluateDrive(
    toEngineDrive(v.drive, {
      motorStepsPerRev: v.motorStepsPerRev,
      microsteps: v.microsteps,
      gearRatio: v.gearRatio ?? 1,
    }),
  );
}

function change(
  actor: SessionUser,
  from: number,
  to: number,
  reason: StepsChange['reason'],
  trialId?: string,
): StepsChange {
  return { from, to, at: new Date().toISOString(), by: actor.name, reason, ...(trialId ? { trialId } : {}) };
}

function diff(before: AxisRow, after: AxisRow): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const key of [
    'name',
    'lengthUnit',
    'drive',
    'motorStepsPerRev',
    'microsteps',
    'gearRatio',
    'stepsPerMm',
    'maxFeedRateMmPerMin',
    'measuredTravelMm',
    'notes',
  ] as const) {
    if (JSON.stringify(before[key]) !== JSON.stringify(after[key])) out[key] = { from: before[key], to: after[key] };
  }
  return out;
}
