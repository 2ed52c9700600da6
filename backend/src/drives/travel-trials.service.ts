import {
  BadRequestException,
  ConflictException,
  Injectable,
  NotFoundException,
  OnModuleInit,
  UnprocessableEntityException,
} from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { evaluateDrive } from '../engine/steps-per-mm.js';
import { thermalReference } from '../engine/thermal.js';
import { evaluateTravelTrial, FAR_FROM_THEORY_PERCENT } from '../engine/travel-trial.js';
import { toMm } from '../engine/units.js';
import { toEngineDrive } from './drive-record.js';
import { trialTargetWarnings } from './result-warnings.js';
import { resolutionMmOf, temperatureWarnings } from './temperature.js';
import { MachinesService } from '../machines/machines.service.js';
import { RecordsService } from '../records/records.service.js';
import { SubjectsRegistry } from '../records/subjects.registry.js';
import { AxesService } from './axes.service.js';
import { storedTravelTrial, toTravelTrialListItem, toTravelTrialResponse } from './axis-check.mapper.js';
import { DEFAULT_PAGE_SIZE } from '../records/page-cursor.js';
import type { PageQuery } from '../records/page.query.js';
import { AxisChecksRepository, type TravelTrialRow } from './axis-checks.repository.js';
import { DriveTargetsService } from './drive-targets.js';
import type { ApplyTravelTrialDto, CreateTravelTrialDto } from './dto/travel-trial.dto.js';

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
      return row
        ? {
            machineId: row.machineId,
            recordType: 'travel-trial',
            recordId: id,
            label: `Travel trial of ${row.axisName}`,
          }
        : null;
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
    const [rows, targets] = await Promise.all([
      this.repo.trialPage(actor.workshopId, axisId, query.cursor ?? null, limit),
      this.targetsOf(actor, axis.machineId),
    ]);
    const page = rows.slice(0, limit);
    const locked = await this.records.lockedIds(
      'travel-trial',
      page.map((r) => r.id),
    );
    return {
      items: page.map((r) => toTravelTrialListItem(r, targets, locked.has(r.id))),
      nextCursor: rows.length > limit ? page[page.length - 1].id : null,
    };
  }

  async get(actor: SessionUser, axisId: string, id: string) {
    const axis = await this.axes.findRow(actor, axisId);
    return this.respond(await this.findRow(actor, axisId, id), await this.targetsOf(actor, axis.machineId));
  }

  async create(actor: SessionUser, axisId: string, dto: CreateTravelTrialDto) {
    const axis = await this.axes.findRow(actor, axisId);
    const stepsPerMmUsed = dto.stepsPerMmUsed ?? axis.stepsPerMm;
    const lengthUnit = dto.lengthUnit ?? 'mm';
    const readingUnit = dto.readingUnit ?? 'mm';
    const moves = dto.moves.map((m) => ({ commanded: m.commanded, measured: m.measured }));
    const resolutionMm = resolutionMmOf(dto.instrumentResolution, readingUnit);
    const thermal = thermalReference({
      machineTemperatureC: dto.machineTemperature,
      scaleTemperatureC: dto.scaleTemperature,
      scaleMaterial: dto.scaleMaterial,
    });
    const theory = evaluateDrive(toEngineDrive(axis.drive, axis)).stepsPerMm;
    const targets = await this.targetsOf(actor, axis.machineId);
    const movesMm = moves.map((m) => ({
      commandedMm: toMm(m.commanded, lengthUnit),
      measuredMm: toMm(m.measured, lengthUnit),
    }));
    const result = evaluateTravelTrial({
      stepsPerMmUsed,
      moves: movesMm,
      throughOrigin: dto.throughOrigin,
      theoreticalStepsPerMm: theory,
      thermalFactor: thermal.factor,
    });
    const warnings = [
      ...result.warnings,
      ...trialTargetWarnings({
        longestMoveMm: Math.max(...movesMm.map((m) => Math.abs(m.commandedMm))),
        resolutionMm,
        thermalPercent: result.thermalCorrectionPercent,
        tolerancePercent: targets.stepsPerMmError.base,
      }),
      ...temperatureWarnings(dto),
    ];
    const row = await this.repo.insertTrial({
      workshopId: actor.workshopId,
      machineId: axis.machineId,
      axisId,
      lengthUnit,
      readingUnit,
      machineTemperatureC: dto.machineTemperature ?? null,
      scaleTemperatureC: dto.scaleTemperature ?? null,
      scaleMaterial: dto.scaleMaterial ?? null,
      instrumentResolution: dto.instrumentResolution ?? null,
      stepsPerMmUsed,
      moves,
      throughOrigin: dto.throughOrigin ?? false,
      result: { ...result, warnings, thermal } as unknown as Record<string, unknown>,
      notes: dto.notes ?? '',
      recordedById: actor.id,
      recordedByName: actor.name,
    });
    const response = toTravelTrialResponse(row, targets, false);
    await this.records.checkRecorded(
      actor,
      {
        machineId: axis.machineId,
        kind: 'travel-trial',
        recordType: 'travel-trial',
        recordId: row.id,
        status: response.status,
      },
      `Travel trial of axis ${axis.name}: ${result.errorPercent.toFixed(3)} % error, corrected ${roundStepsPerMm(result.correctedStepsPerMm)} steps/mm${result.farFromTheory ? ` (${result.theoryDifferencePercent!.toFixed(1)} % from the theoretical ${roundStepsPerMm(theory)} steps/mm: held back until confirmed)` : ''}`,
    );
    return response;
  }

  /**
   * Makes the trial's corrected value the axis's steps per mm. Idempotent: applying the same trial
   * again (a double click, a retry) answers the axis as it is and changes nothing. The machine's
   * row is locked first, so parallel applies run one after the other, and an approved machine refuses.
   * A correction more than 5 % from the drive's theoretical steps per mm (or one that cannot be
   * right) is applied only with `confirmFarCorrection: true`.
   */
  async apply(actor: SessionUser, axisId: string, id: string, dto: ApplyTravelTrialDto = {}) {
    const found = await this.axes.findRow(actor, axisId);
    await this.machines.lockForChange(actor, found.machineId);
    const axis = await this.axes.findRow(actor, axisId);
    const trial = await this.findRow(actor, axisId, id);
    const result = storedTravelTrial(trial.result);
    if (!result)
      throw new ConflictException(
        "This trial's stored result cannot be read, so it cannot be applied: record the trial again",
      );
    const corrected = roundStepsPerMm(result.correctedStepsPerMm);
    if (!(corrected > 0) || !Number.isFinite(corrected))
      throw new BadRequestException(['the trial has no usable corrected steps per mm']);
    const theory = evaluateDrive(toEngineDrive(axis.drive, axis)).stepsPerMm;
    const fromTheory = (corrected / theory - 1) * 100;
    const far =
      Math.abs(fromTheory) > FAR_FROM_THEORY_PERCENT || (result as { farFromTheory?: boolean }).farFromTheory === true;
    if (far && !trial.appliedAt && dto.confirmFarCorrection !== true) {
      throw new UnprocessableEntityException([
        `confirmFarCorrection: the corrected ${corrected} steps/mm is ${fromTheory >= 0 ? '+' : ''}${fromTheory.toFixed(1)} % from the drive's theoretical ${roundStepsPerMm(theory)} steps/mm (more than ${FAR_FROM_THEORY_PERCENT} %). Check the lead (not the pitch), the pulley teeth and the microsteps first; send confirmFarCorrection: true to apply it anyway.`,
      ]);
    }
    if (trial.appliedAt) {
      if (axis.stepsPerMm === corrected) return this.axes.respond(axis);
      throw new ConflictException(
        `This trial's correction (${corrected} steps/mm) was applied on ${trial.appliedAt.toISOString().slice(0, 10)} by ${trial.appliedByName}; the axis has been set to ${axis.stepsPerMm} steps/mm since. Record a new trial to correct it again.`,
      );
    }
    const row = await this.axes.applyStepsPerMm(actor, axis, corrected, id, far ? fromTheory : null);
    await this.repo.markApplied(actor.workshopId, id, actor.name);
    return this.axes.respond(row);
  }

  async delete(actor: SessionUser, axisId: string, id: string): Promise<void> {
    const trial = await this.findRow(actor, axisId, id);
    await this.records.assertEditable('travel-trial', id, 'This travel trial');
    await this.repo.deleteTrial(actor.workshopId, id);
    await this.records.audit(actor, {
      machineId: trial.machineId,
      recordType: 'travel-trial',
      recordId: id,
      action: 'deleted',
      summary: 'Travel trial deleted',
    });
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
