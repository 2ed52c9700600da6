import type { SubjectRef } from '../records/subjects.registry.js';
import { bedGrids } from '../database/schema/index.js';
import { checkTable, type CheckRecords } from '../records/check-records.js';
import { CheckRecordsRepository } from '../records/check-records.repository.js';
import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import type { BedGridPointMm } from '../database/schema/frame.js';
import { fromMm, toMm } from '../engine/units.js';
import { MachinesService } from '../machines/machines.service.js';
import type { CheckSeries, MachineRef, ReadinessCheck, ReadinessContext } from '../records/readiness.js';
import { RecordsService } from '../records/records.service.js';
import { bedGridResult, judgedBasisFor, type BedGridPointResult, type BedGridResult } from './bed-grid-result.js';
import { readableComputation } from '../common/stored-result.js';
import type { CreateBedGridDto } from './dto/create-bed-grid.dto.js';
import { FrameTargets, frameTargetIn, judge, type TargetOf } from './frame-targets.js';
import { bedGridWarnings, show } from './frame-warnings.js';
import { toBedGridResponse, type BedGridResponse } from './frame.mapper.js';

/** The numbers the readers of a bed grid use, computed again from its stored points. */
const BED_GRID_SHAPE = [
  'leastSquares.flatnessMm',
  'minimumZone.flatnessMm',
  'judged.valueMm',
  'tilt.mmPerMetre',
  'points[]',
  'points[].xMm',
  'points[].yMm',
  'points[].residualMm',
  'points[].judgedHeightMm',
];

export const BED_GRID = 'bed-grid';
/** Where bed grids are kept: under their machine, newest by the time recorded. */
export const BED_GRID_TABLE = checkTable({ type: BED_GRID, table: bedGrids, parent: 'machineId', time: 'recordedAt' });
export type BedGridRow = typeof bedGrids.$inferSelect;
/** The list shows at most this many, newest first. */
const LISTED = 100;

type GridMachine = Pick<MachineRef, 'kind' | 'workAreaXMm' | 'workAreaYMm'>;

@Injectable()
export class BedGridsService {
  private readonly repo: CheckRecords<typeof bedGrids>;

  constructor(
    checkRecords: CheckRecordsRepository,
    private readonly machines: MachinesService,
    private readonly targets: FrameTargets,
    private readonly records: RecordsService,
  ) {
    this.repo = checkRecords.of(BED_GRID_TABLE);
  }

  async create(actor: SessionUser, machineId: string, dto: CreateBedGridDto): Promise<BedGridResponse> {
    const machine = await this.machines.getRef(actor, machineId);
    const lengthUnit = dto.lengthUnit ?? 'mm';
    const readingUnit = dto.readingUnit ?? 'mm';
    if ((dto.rows == null) !== (dto.columns == null))
      throw new BadRequestException([
        `${dto.rows == null ? 'rows' : 'columns'} is needed with ${dto.rows == null ? 'columns' : 'rows'}`,
      ]);
    if (dto.rows != null && dto.columns != null && dto.rows * dto.columns !== dto.points.length) {
      throw new BadRequestException([
        `points must hold rows × columns = ${dto.rows * dto.columns} points (got ${dto.points.length})`,
      ]);
    }
    const points: BedGridPointMm[] = dto.points.map((p) => ({
      xMm: toMm(p.x, lengthUnit),
      yMm: toMm(p.y, lengthUnit),
      zMm: toMm(p.z, readingUnit),
    }));
    // Evaluated before saving: a grid the engine refuses (all on one line, repeated positions) is never stored.
    bedGridResult(points, judgedBasisFor(machine.kind));
    const row = await this.repo.insert({
      workshopId: actor.workshopId,
      machineId: machine.id,
      lengthUnit,
      readingUnit,
      resolutionMm: dto.resolution == null ? null : toMm(dto.resolution, readingUnit),
      rows: dto.rows ?? null,
      columns: dto.columns ?? null,
      points,
      note: dto.note?.trim() ?? '',
      recordedById: actor.id,
      recordedByName: actor.name,
    });
    const response = this.respond(row, machine, await this.targets.of(machine, 'bedFlatness'), false);
    const judged = response.result!.judged;
    await this.records.checkRecorded(
      actor,
      { machineId: machine.id, kind: BED_GRID, recordType: BED_GRID, recordId: row.id, status: response.status },
      `Bed grid of ${points.length} points: ${lowerFirst(judged.label)} ${show(judged.valueMm, readingUnit)}, ${response.status.replace('-', ' ')}`,
    );
    return response;
  }

  /** Removes a record entered by mistake; one an approval was based on is kept (409). */
  async remove(actor: SessionUser, machineId: string, id: string): Promise<void> {
    const machine = await this.machines.getRef(actor, machineId);
    const row = await this.repo.byId(actor.workshopId, id);
    if (!row || row.machineId !== machine.id) throw new NotFoundException('No such bed grid on this machine');
    await this.records.assertEditable(BED_GRID, row.id, 'This bed grid');
    await this.repo.delete(actor.workshopId, row.id);
    await this.records.audit(actor, {
      machineId: machine.id,
      recordType: BED_GRID,
      recordId: row.id,
      action: 'deleted',
      summary: `Bed grid of ${row.recordedAt.toISOString().slice(0, 10)} by ${row.recordedByName} deleted`,
    });
  }

  async list(actor: SessionUser, machineId: string): Promise<BedGridResponse[]> {
    const machine = await this.machines.getRef(actor, machineId);
    const rows = await this.repo.newest(actor.workshopId, machine.id, LISTED);
    const locked = await this.records.lockedIds(
      BED_GRID,
      rows.map((r) => r.id),
    );
    const target = await this.targets.of(machine, 'bedFlatness');
    return rows.map((r) => this.respond(r, machine, target, locked.has(r.id)));
  }

  async readiness(machine: MachineRef, context: ReadinessContext): Promise<ReadinessCheck> {
    const [row] = await this.repo.newest(machine.workshopId, machine.id, 1);
    const t = frameTargetIn(context, 'bedFlatness');
    const base: ReadinessCheck = {
      key: `${BED_GRID}:${machine.id}`,
      kind: BED_GRID,
      subject: 'Bed flatness (grid)',
      status: 'not-started',
      target: t.target,
      result: null,
      recordType: BED_GRID,
      recordId: null,
      recordedAt: null,
      place: { machineId: machine.id, tab: 'frame' },
      warnings: [],
    };
    if (!row) return base;
    const r = this.respond(row, machine, t, false);
    if (!r.result) {
      // A latest grid that cannot be read blocks like a failed one and says why.
      return {
        ...base,
        subject: `${base.subject} (latest bed grid unreadable)`,
        status: 'outside-target',
        result: null,
        recordId: row.id,
        recordedAt: r.recordedAt,
      };
    }
    const unit = row.readingUnit;
    const { judged, leastSquares, minimumZone } = r.result;
    return {
      ...base,
      status: r.status,
      result: {
        value: fromMm(judged.valueMm, unit),
        unit,
        summary: `${judged.label}: ${show(judged.valueMm, unit)} over ${row.points.length} points (judged); minimum zone ${show(minimumZone.flatnessMm, unit)}, least squares ${show(leastSquares.flatnessMm, unit)}; tilt ${r.result.tilt.mmPerMetre.toFixed(2)} mm/m`,
      },
      recordId: row.id,
      recordedAt: r.recordedAt,
      warnings: r.warnings,
      ...(context.series && { series: bedMapSeries(r.result, row, t) }),
    };
  }

  async resolve(workshopId: string, id: string): Promise<SubjectRef | null> {
    const row = await this.repo.byId(workshopId, id);
    return row
      ? {
          machineId: row.machineId,
          recordType: BED_GRID,
          recordId: row.id,
          label: `Bed grid of ${row.recordedAt.toISOString().slice(0, 10)}`,
        }
      : null;
  }

  private respond(row: BedGridRow, machine: GridMachine, { target, base }: TargetOf, locked: boolean): BedGridResponse {
    const result = readableComputation(() => bedGridResult(row.points, judgedBasisFor(machine.kind)), BED_GRID_SHAPE);
    const warnings = result
      ? bedGridWarnings(row.points, result, {
          workAreaXMm: machine.workAreaXMm,
          workAreaYMm: machine.workAreaYMm,
          targetMm: base,
          resolutionMm: row.resolutionMm,
          lengthUnit: row.lengthUnit,
          readingUnit: row.readingUnit,
        })
      : [];
    return toBedGridResponse(
      row,
      result,
      result ? judge(result.judged.valueMm, base) : 'outside-target',
      target,
      locked,
      warnings,
    );
  }
}

/**
 * The bed map for the certificate: one line per grid row (Y0 first, label "Row r · Y = y <unit>"),
 * points [x in the grid's lengthUnit, height in its readingUnit] in X order. Heights are above the
 * lower bound of the judged zone, so every point lies between 0 and the judged value, and the
 * target is the one limit: a point above it is where the bed is out.
 */
export function bedMapSeries(
  r: BedGridResult,
  row: Pick<BedGridRow, 'lengthUnit' | 'readingUnit'>,
  t: TargetOf,
): CheckSeries {
  const { lengthUnit, readingUnit } = row;
  return {
    title: `Bed map: ${lowerFirst(r.judged.label)}, ${r.rows} rows by ${r.columns} columns`,
    x: { label: 'X position', unit: lengthUnit },
    y: { label: 'Height above the lowest of the judged zone', unit: readingUnit },
    lines: rowsOf(r.points).map(([n, pts]) => ({
      label: `Row ${n} · Y = ${Number(fromMm(pts[0].yMm, lengthUnit).toFixed(4))} ${lengthUnit}`,
      points: pts.map((p): [number, number] => [
        Number(fromMm(p.xMm, lengthUnit).toFixed(6)),
        fromMm(p.judgedHeightMm, readingUnit),
      ]),
    })),
    limits: [{ label: `Target ${t.target.value} ${t.target.unit}`, value: fromMm(t.base, readingUnit) }],
  };
}

function rowsOf(points: BedGridPointResult[]): [number, BedGridPointResult[]][] {
  const byRow = new Map<number, BedGridPointResult[]>();
  for (const p of points) byRow.set(p.row, [...(byRow.get(p.row) ?? []), p]);
  return [...byRow.entries()].sort((a, b) => a[0] - b[0]).map(([n, pts]) => [n, pts.sort((a, b) => a.xMm - b.xMm)]);
}

/** "Minimum-zone flatness (ISO 1101)" → "minimum-zone flatness (ISO 1101)": only the first letter, so names keep their capitals. */
const lowerFirst = (text: string) => text.charAt(0).toLowerCase() + text.slice(1);
