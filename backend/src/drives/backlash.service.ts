import { BadRequestException, Injectable, NotFoundException, OnModuleInit } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { evaluateBacklash } from '../engine/backlash.js';
import { arrayToMm, fromMm, toMm } from '../engine/units.js';
import { MachinesService } from '../machines/machines.service.js';
import { backlashChecks } from '../database/schema/index.js';
import { checkTable, type CheckRecords } from '../records/check-records.js';
import { CheckRecordsRepository } from '../records/check-records.repository.js';
import { DEFAULT_PAGE_SIZE } from '../records/page-cursor.js';
import type { PageQuery } from '../records/page.query.js';
import { RecordsService } from '../records/records.service.js';
import { SubjectsRegistry } from '../records/subjects.registry.js';
import { AxesService } from './axes.service.js';
import { positionProblems } from './backlash-positions.js';
import { toBacklashResponse } from './backlash.mapper.js';
import { DriveTargetsService } from './drive-targets.js';
import type { CreateBacklashCheckDto } from './dto/backlash.dto.js';

export const BACKLASH_RECORD = 'backlash-check';
/** Where backlash checks are kept: under their axis. */
export const BACKLASH_TABLE = checkTable({ type: BACKLASH_RECORD, table: backlashChecks, parent: 'axisId' });
export type BacklashCheckRow = typeof backlashChecks.$inferSelect;

/** Backlash checks of an axis: readings from both sides at both ends and the middle of its travel. */
@Injectable()
export class BacklashService implements OnModuleInit {
  private readonly repo: CheckRecords<typeof backlashChecks>;

  constructor(
    checkRecords: CheckRecordsRepository,
    private readonly axes: AxesService,
    private readonly machines: MachinesService,
    private readonly targets: DriveTargetsService,
    private readonly records: RecordsService,
    private readonly subjects: SubjectsRegistry,
  ) {
    this.repo = checkRecords.of(BACKLASH_TABLE);
  }

  onModuleInit() {
    this.subjects.register(BACKLASH_RECORD, async (workshopId, id) => {
      const row = await this.repo.byId(workshopId, id);
      if (!row) return null;
      const axis = await this.axes.findRow({ workshopId }, row.axisId);
      return {
        machineId: row.machineId,
        recordType: BACKLASH_RECORD,
        recordId: id,
        label: `Backlash check of ${axis.name}`,
      };
    });
  }

  async list(actor: SessionUser, axisId: string, query: PageQuery = {}) {
    const axis = await this.axes.findRow(actor, axisId);
    const limit = query.limit ?? DEFAULT_PAGE_SIZE;
    const [rows, target] = await Promise.all([
      this.repo.page(actor.workshopId, axisId, query.cursor ?? null, limit),
      this.targetOf(actor, axis.machineId),
    ]);
    const page = rows.slice(0, limit);
    const locked = await this.records.lockedIds(
      BACKLASH_RECORD,
      page.map((r) => r.id),
    );
    return {
      items: page.map((r) => toBacklashResponse(r, target, locked.has(r.id))),
      nextCursor: rows.length > limit ? page[page.length - 1].id : null,
    };
  }

  async get(actor: SessionUser, axisId: string, id: string) {
    const axis = await this.axes.findRow(actor, axisId);
    const row = await this.findRow(actor, axisId, id);
    const locked = await this.records.lockedIds(BACKLASH_RECORD, [id]);
    return toBacklashResponse(row, await this.targetOf(actor, axis.machineId), locked.has(id));
  }

  async create(actor: SessionUser, axisId: string, dto: CreateBacklashCheckDto) {
    const axis = await this.axes.findRow(actor, axisId);
    await this.machines.lockForChange(actor, axis.machineId);
    const lengthUnit = dto.lengthUnit ?? 'mm';
    const readingUnit = dto.readingUnit ?? 'mm';
    const problems = positionProblems(
      dto.positions.map((p) => p.position),
      lengthUnit,
      axis.measuredTravelMm,
    );
    if (problems.length) throw new BadRequestException(problems);
    const target = await this.targetOf(actor, axis.machineId);
    const result = evaluateBacklash({
      positions: dto.positions.map((p) => ({
        positionMm: toMm(p.position, lengthUnit),
        upMm: arrayToMm(p.up, readingUnit),
        downMm: arrayToMm(p.down, readingUnit),
      })),
      resolutionMm: dto.resolution === undefined ? null : toMm(dto.resolution, readingUnit),
      targetMm: target.base,
    });
    const row = await this.repo.insert({
      workshopId: actor.workshopId,
      machineId: axis.machineId,
      axisId,
      lengthUnit,
      readingUnit,
      positions: dto.positions.map((p) => ({ position: p.position, up: p.up, down: p.down })),
      resolution: dto.resolution ?? null,
      result: result as unknown as Record<string, unknown>,
      notes: dto.notes ?? '',
      recordedById: actor.id,
      recordedByName: actor.name,
    });
    const response = toBacklashResponse(row, target, false);
    const shown = (mm: number) => `${fromMm(mm, readingUnit).toPrecision(3)} ${readingUnit}`;
    await this.records.checkRecorded(
      actor,
      {
        machineId: axis.machineId,
        kind: 'backlash',
        recordType: BACKLASH_RECORD,
        recordId: row.id,
        status: response.status,
      },
      `Backlash check of axis ${axis.name}: largest ${shown(result.backlashMm)} at ${fromMm(result.worstPositionMm, lengthUnit)} ${lengthUnit} over ${result.positions.length} positions`,
    );
    return response;
  }

  async delete(actor: SessionUser, axisId: string, id: string): Promise<void> {
    const row = await this.findRow(actor, axisId, id);
    await this.machines.lockForChange(actor, row.machineId);
    await this.records.assertEditable(BACKLASH_RECORD, id, 'This backlash check');
    await this.repo.delete(actor.workshopId, id);
    await this.records.audit(actor, {
      machineId: row.machineId,
      recordType: BACKLASH_RECORD,
      recordId: id,
      action: 'deleted',
      summary: 'Backlash check deleted',
    });
  }

  private async findRow(actor: SessionUser, axisId: string, id: string): Promise<BacklashCheckRow> {
    const row = await this.repo.find(actor.workshopId, axisId, id);
    if (!row) throw new NotFoundException('No such backlash check of this axis');
    return row;
  }

  private async targetOf(actor: SessionUser, machineId: string) {
    return (await this.targets.forMachine(await this.machines.getRef(actor, machineId))).reversal;
  }
}
