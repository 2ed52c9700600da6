import { BadRequestException, ConflictException, Injectable, NotFoundException, OnModuleInit } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { evaluateTravelTrial } from '../engine/travel-trial.js';
import { toMm } from '../engine/units.js';
import { MachinesService } from '../machines/machines.service.js';
import { RecordsService } from '../records/records.service.js';
import { SubjectsRegistry } from '../records/subjects.registry.js';
import { AxesService } from './axes.service.js';
import { storedTravelTrial, toTravelTrialListItem, toTravelTrialResponse } from './axis-check.mapper.js';
import { DEFAULT_PAGE_SIZE } from '../records/page-cursor.js';
import type { PageQuery } from '../records/page.query.js';
import { AxisChecksRepository, type TravelTrialRow } from './axis-checks.repository.js';
import { DriveTargetsService } from './drive-targets.js';
import type { CreateTravelTrialDto } from './dto/travel-trial.dto.js';

/** Corrected values are stored as a controller takes them: four decimals. */
export const roundStepsPerMm = (v: number) => Math.round(v * 1e4) / 1e4;

@Injectable()
export class TravelTrialsService implements OnModuleInit {
  constructor(
    private readonly repo: AxisChecksRepository,
    private readonly axes: AxesService,
    private readonly machines: MachinesService,
    private readonly targets: DriveTargetsService,
    private readonly records: RecordsService,
    private readonly subjects: SubjectsRegistry,
  ) {}

  onModuleInit() {
    this.subjects.register('travel-trial', async (workshopId, id) => {
      const row = await this.findAnywhere(workshopId, id);
      return row ? { machineId: row.machineId, recordType: 'travel-trial', recordId: id, label: `Travel trial of ${row.axisName}` } : null;
    });
  }

  private async findAnywhere(workshopId: string, id: string) {
    // Subjects arrive without their axis; look through the row by id within the workshop.
    const row = await this.repo.trialById(workshopId, id);
    if (!row) return null;
    const axis = await this.axes.findRow({ workshopId }, row.axisId);
    return { ...row, axisName: axis.name };
  }

  /** A page of the axis's trials, newest first, without their moves; `nextCursor` asks for the page after. */
  async list(actor: SessionUser, axisId: string, query: PageQuery = {}) {
    const axis = await this.axes.findRow(actor, axisId);
    const limit = query.limit ?? DEFAULT_PAGE_SIZE;
    const [rows, targets] = await Promise.all([this.repo.trialPage(actor.workshopId, axisId, query.cursor ?? null, limit), this.targetsOf(actor, axis.machineId)]);
    const page = rows.slice(0, limit);
    const locked = await this.records.lockedIds('travel-trial', page.map((r) => r.id));
    return { items: page.map((r) => toTravelTrialListItem(r, targets, locked.has(r.id))), nextCursor: rows.length > limit ? page[page.length - 1].id : null };
  }

  async get(actor: SessionUser, axisId: string, id: string) {
    const axis = await this.axes.findRow(actor, axisId);
    return this.respond(await this.findRow(actor, axisId, id), await this.targetsOf(actor, axis.machineId));
  }

  async create(actor: SessionUser, axisId: string, dto: CreateTravelTrialDto) {
    const axis = await this.axes.findRow(actor, axisId);
    const stepsPerMmUsed = dto.stepsPerMmUsed ?? axis.stepsPerMm;
    const result = evaluateTravelTrial({
      stepsPerMmUsed,
      moves: dto.moves.map((m) => ({ commandedMm: m.commanded, measuredMm: toMm(m.measured, dto.unit) })),
      throughOrigin: dto.throughOrigin,
    });
    const row = await this.repo.insertTrial({
      workshopId: actor.workshopId,
      machineId: axis.machineId,
      axisId,
      unit: dto.unit,
      stepsPerMmUsed,
      moves: dto.moves.map((m) => ({ commanded: m.commanded, measured: m.measured })),
      throughOrigin: dto.throughOrigin ?? false,
      result: result as unknown as Record<string, unknown>,
      notes: dto.notes ?? '',
      recordedById: actor.id,
      recordedByName: actor.name,
    });
    const targets = await this.targetsOf(actor, axis.machineId);
    const response = toTravelTrialResponse(row, targets, false);
    await this.records.checkRecorded(
      actor,
      { machineId: axis.machineId, kind: 'travel-trial', recordType: 'travel-trial', recordId: row.id, status: response.status },
      `Travel trial of axis ${axis.name}: ${result.errorPercent.toFixed(3)} % error, corrected ${roundStepsPerMm(result.correctedStepsPerMm)} steps/mm`,
    );
    return response;
  }

  /**
   * Makes the trial's corrected value the axis's steps per mm. Idempotent: applying the same trial
   * again (a double click, a retry) answers the axis as it is and changes nothing. The machine's
   * row is locked first, so parallel applies run one after the other, and an approved machine refuses.
   */
  async apply(actor: SessionUser, axisId: string, id: string) {
    const found = await this.axes.findRow(actor, axisId);
    await this.machines.lockForChange(actor, found.machineId);
    const axis = await this.axes.findRow(actor, axisId);
    const trial = await this.findRow(actor, axisId, id);
    const result = storedTravelTrial(trial.result);
    if (!result) throw new ConflictException('This trial\'s stored result cannot be read, so it cannot be applied: record the trial again');
    const corrected = roundStepsPerMm(result.correctedStepsPerMm);
    if (!(corrected > 0)) throw new BadRequestException(['the trial has no usable corrected steps per mm']);
    if (trial.appliedAt) {
      if (axis.stepsPerMm === corrected) return this.axes.respond(axis);
      throw new ConflictException(
        `This trial's correction (${corrected} steps/mm) was applied on ${trial.appliedAt.toISOString().slice(0, 10)} by ${trial.appliedByName}; the axis has been set to ${axis.stepsPerMm} steps/mm since. Record a new trial to correct it again.`,
      );
    }
    const row = await this.axes.applyStepsPerMm(actor, axis, corrected, id);
    await this.repo.markApplied(actor.workshopId, id, actor.name);
    return this.axes.respond(row);
  }

  async delete(actor: SessionUser, axisId: string, id: string): Promise<void> {
    const trial = await this.findRow(actor, axisId, id);
    await this.records.assertEditable('travel-trial', id, 'This travel trial');
    await this.repo.deleteTrial(actor.workshopId, id);
    await this.records.audit(actor, { machineId: trial.machineId, recordType: 'travel-trial', recordId: id, action: 'deleted', summary: 'Travel trial deleted' });
  }

  private async findRow(actor: SessionUser, axisId: string, id: string): Promise<TravelTrialRow> {
    const row = await this.repo.trial(actor.workshopId, axisId, id);
    if (!row) throw new NotFoundException('No such travel trial of this axis');
    return row;
  }

  private async respond(row: TravelTrialRow, targets: Awaited<ReturnType<DriveTargetsService['forMachine']>>) {
    const locked = await this.records.lockedIds('travel-trial', [row.id]);
    return toTravelTrialResponse(row, targets, locked.has(row.id));
  }

  private async targetsOf(actor: SessionUser, machineId: string) {
    return this.targets.forMachine(await this.machines.getRef(actor, machineId));
  }
}
