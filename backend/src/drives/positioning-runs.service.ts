import { BadRequestException, Injectable, NotFoundException, OnModuleInit } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { evaluatePositioning } from '../engine/positioning.js';
import { thermalReference } from '../engine/thermal.js';
import { arrayToMm } from '../engine/units.js';
import { resolutionMmOf, temperatureWarnings } from './temperature.js';
import { MachinesService } from '../machines/machines.service.js';
import { RecordsService } from '../records/records.service.js';
import { SubjectsRegistry } from '../records/subjects.registry.js';
import { AxesService } from './axes.service.js';
import { toPositioningRunListItem, toPositioningRunResponse } from './axis-check.mapper.js';
import { DEFAULT_PAGE_SIZE } from '../records/page-cursor.js';
import type { PageQuery } from '../records/page.query.js';
import { AxisChecksRepository, type PositioningRunRow } from './axis-checks.repository.js';
import { DriveTargetsService } from './drive-targets.js';
import type { CreatePositioningRunDto } from './dto/positioning-run.dto.js';

/** Repeat-and-reverse runs (ISO 230-2 positioning test) of an axis. */
@Injectable()
export class PositioningRunsService implements OnModuleInit {
  constructor(
    private readonly repo: AxisChecksRepository,
    private readonly axes: AxesService,
    private readonly machines: MachinesService,
    private readonly targets: DriveTargetsService,
    private readonly records: RecordsService,
    private readonly subjects: SubjectsRegistry,
  ) {}

  onModuleInit() {
    this.subjects.register('positioning-run', async (workshopId, id) => {
      const row = await this.repo.runById(workshopId, id);
      if (!row) return null;
      const axis = await this.axes.findRow({ workshopId }, row.axisId);
      return {
        machineId: row.machineId,
        recordType: 'positioning-run',
        recordId: id,
        label: `Repeat-and-reverse run of ${axis.name}`,
      };
    });
  }

  /** A page of the axis's runs, newest first, without their deviations; `nextCursor` asks for the page after. */
  async list(actor: SessionUser, axisId: string, query: PageQuery = {}) {
    const axis = await this.axes.findRow(actor, axisId);
    const limit = query.limit ?? DEFAULT_PAGE_SIZE;
    const [rows, targets] = await Promise.all([
      this.repo.runPage(actor.workshopId, axisId, query.cursor ?? null, limit),
      this.targetsOf(actor, axis.machineId),
    ]);
    const page = rows.slice(0, limit);
    const locked = await this.records.lockedIds(
      'positioning-run',
      page.map((r) => r.id),
    );
    return {
      items: page.map((r) => toPositioningRunListItem(r, targets, locked.has(r.id))),
      nextCursor: rows.length > limit ? page[page.length - 1].id : null,
    };
  }

  async get(actor: SessionUser, axisId: string, id: string) {
    const axis = await this.axes.findRow(actor, axisId);
    const row = await this.findRow(actor, axisId, id);
    const locked = await this.records.lockedIds('positioning-run', [id]);
    return toPositioningRunResponse(row, await this.targetsOf(actor, axis.machineId), locked.has(id));
  }

  async create(actor: SessionUser, axisId: string, dto: CreatePositioningRunDto) {
    const axis = await this.axes.findRow(actor, axisId);
    // The grid's columns are positions along the axis; a record keeps them in order.
    for (let i = 1; i < dto.targets.length; i++) {
      if (!(dto.targets[i] > dto.targets[i - 1]))
        throw new BadRequestException([
          `targets must rise along the axis (targets[${i}] = ${dto.targets[i]} is not above ${dto.targets[i - 1]})`,
        ]);
    }
    const lengthUnit = dto.lengthUnit ?? 'mm';
    const readingUnit = dto.readingUnit ?? 'mm';
    const targets = await this.targetsOf(actor, axis.machineId);
    const thermal = thermalReference({
      machineTemperatureC: dto.machineTemperature,
      scaleTemperatureC: dto.scaleTemperature,
      scaleMaterial: dto.scaleMaterial,
    });
    const result = evaluatePositioning({
      targetsMm: arrayToMm(dto.targets, lengthUnit),
      runs: dto.runs.map((r) => ({ direction: r.direction, deviationsMm: arrayToMm(r.deviations, readingUnit) })),
      thermalFactor: thermal.factor,
      instrumentResolutionMm: resolutionMmOf(dto.instrumentResolution, readingUnit) ?? undefined,
      // The tightest of the three figures' targets: the instrument must resolve a quarter of it.
      toleranceMm: Math.min(targets.positioningAccuracy.base, targets.repeatability.base, targets.reversal.base),
    });
    const warnings = [...result.warnings, ...temperatureWarnings(dto)];
    const row = await this.repo.insertRun({
      workshopId: actor.workshopId,
      machineId: axis.machineId,
      axisId,
      lengthUnit,
      readingUnit,
      machineTemperatureC: dto.machineTemperature ?? null,
      scaleTemperatureC: dto.scaleTemperature ?? null,
      scaleMaterial: dto.scaleMaterial ?? null,
      instrumentResolution: dto.instrumentResolution ?? null,
      targets: dto.targets,
      runs: dto.runs.map((r) => ({ direction: r.direction, deviations: r.deviations })),
      result: { ...result, warnings, thermal } as unknown as Record<string, unknown>,
      notes: dto.notes ?? '',
      recordedById: actor.id,
      recordedByName: actor.name,
    });
    const response = toPositioningRunResponse(row, targets, false);
    await this.records.checkRecorded(
      actor,
      {
        machineId: axis.machineId,
        kind: 'positioning',
        recordType: 'positioning-run',
        recordId: row.id,
        status: response.status,
      },
      `Repeat-and-reverse run of axis ${axis.name}: accuracy ${result.accuracyMm.toFixed(3)} mm, repeatability ${result.repeatabilityMm.toFixed(3)} mm, reversal ${result.reversalMm.toFixed(3)} mm`,
    );
    return response;
  }

  async delete(actor: SessionUser, axisId: string, id: string): Promise<void> {
    const row = await this.findRow(actor, axisId, id);
    await this.records.assertEditable('positioning-run', id, 'This repeat-and-reverse run');
    await this.repo.deleteRun(actor.workshopId, id);
    await this.records.audit(actor, {
      machineId: row.machineId,
      recordType: 'positioning-run',
      recordId: id,
      action: 'deleted',
      summary: 'Repeat-and-reverse run deleted',
    });
  }

  private async findRow(actor: SessionUser, axisId: string, id: string): Promise<PositioningRunRow> {
    const row = await this.repo.run(actor.workshopId, axisId, id);
    if (!row) throw new NotFoundException('No such repeat-and-reverse run of this axis');
    return row;
  }

  private async targetsOf(actor: SessionUser, machineId: string) {
    return this.targets.forMachine(await this.machines.getRef(actor, machineId));
  }
}
