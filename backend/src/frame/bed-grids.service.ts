import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import type { BedGridPointMm } from '../database/schema/frame.js';
import { fromMm, toMm, type LengthUnit } from '../engine/units.js';
import { MachinesService } from '../machines/machines.service.js';
import type { MachineRef, ReadinessCheck, ReadinessContext } from '../records/readiness.js';
import { RecordsService } from '../records/records.service.js';
import { bedGridResult, type BedGridPointResult } from './bed-grid-result.js';
import { readableComputation } from '../common/stored-result.js';

/** The numbers the readers of a bed grid use, computed again from its stored points. */
const BED_GRID_SHAPE = ['leastSquares.flatnessMm', 'tilt.mmPerMetre', 'points[]', 'points[].xMm', 'points[].yMm', 'points[].residualMm'];
import type { CreateBedGridDto } from './dto/create-bed-grid.dto.js';
import { FrameTargets, frameTargetIn, judge, type TargetOf } from './frame-targets.js';
import { toBedGridResponse, type BedGridResponse } from './frame.mapper.js';
import { FrameRepository, type BedGridRow } from './frame.repository.js';

export const BED_GRID = 'bed-grid';

@Injectable()
export class BedGridsService {
  constructor(
    private readonly repo: FrameRepository,
    private readonly machines: MachinesService,
    private readonly targets: FrameTargets,
    private readonly records: RecordsService,
  ) {}

  async create(actor: SessionUser, machineId: string, dto: CreateBedGridDto): Promise<BedGridResponse> {
    const machine = await this.machines.getRef(actor, machineId);
    const unit = dto.unit ?? 'mm';
    if ((dto.rows == null) !== (dto.columns == null)) throw new BadRequestException([`${dto.rows == null ? 'rows' : 'columns'} is needed with ${dto.rows == null ? 'columns' : 'rows'}`]);
    if (dto.rows != null && dto.columns != null && dto.rows * dto.columns !== dto.points.length) {
      throw new BadRequestException([`points must hold rows × columns = ${dto.rows * dto.columns} points (got ${dto.points.length})`]);
    }
    const points: BedGridPointMm[] = dto.points.map((p) => ({ xMm: p.x, yMm: p.y, zMm: toMm(p.z, unit) }));
    // Evaluated before saving: a grid the engine refuses (all on one line, repeated positions) is never stored.
    bedGridResult(points);
    const row = await this.repo.insertBedGrid({
      workshopId: actor.workshopId,
      machineId: machine.id,
      unit,
      rows: dto.rows ?? null,
      columns: dto.columns ?? null,
      points,
      note: dto.note?.trim() ?? '',
      recordedById: actor.id,
      recordedByName: actor.name,
    });
    const response = this.respond(row, await this.targets.of(machine, 'bedFlatness'), false);
    await this.records.checkRecorded(
      actor,
      { machineId: machine.id, kind: BED_GRID, recordType: BED_GRID, recordId: row.id, status: response.status },
      `Bed grid of ${points.length} points: flatness ${show(response.result!.leastSquares.flatnessMm, unit)}, ${response.status.replace('-', ' ')}`,
    );
    return response;
  }

  /** Removes a record entered by mistake; one an approval was based on is kept (409). */
  async remove(actor: SessionUser, machineId: string, id: string): Promise<void> {
    const machine = await this.machines.getRef(actor, machineId);
    const row = await this.repo.findBedGrid(actor.workshopId, id);
    if (!row || row.machineId !== machine.id) throw new NotFoundException('No such bed grid on this machine');
    await this.records.assertEditable(BED_GRID, row.id, 'This bed grid');
    await this.repo.deleteBedGrid(actor.workshopId, row.id);
    await this.records.audit(actor, { machineId: machine.id, recordType: BED_GRID, recordId: row.id, action: 'deleted', summary: `Bed grid of ${row.recordedAt.toISOString().slice(0, 10)} by ${row.recordedByName} deleted` });
  }

  async list(actor: SessionUser, machineId: string): Promise<BedGridResponse[]> {
    const machine = await this.machines.getRef(actor, machineId);
    const rows = await this.repo.listBedGrids(actor.workshopId, machine.id);
    const locked = await this.records.lockedIds(BED_GRID, rows.map((r) => r.id));
    const target = await this.targets.of(machine, 'bedFlatness');
    return rows.map((r) => this.respond(r, target, locked.has(r.id)));
  }

  async readiness(machine: MachineRef, context: ReadinessContext): Promise<ReadinessCheck> {
    const [row] = await this.repo.listBedGrids(machine.workshopId, machine.id, 1);
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
      link: `/machines/${machine.id}?tab=frame`,
    };
    if (!row) return base;
    const r = this.respond(row, t, false);
    if (!r.result) {
      // A latest grid that cannot be read blocks like a failed one and says why.
      return { ...base, subject: `${base.subject} (latest bed grid unreadable)`, status: 'outside-target', recordId: row.id, recordedAt: r.recordedAt };
    }
    // Shown in the target's unit, so result and target read side by side.
    const unit = (['mm', 'um', 'in', 'thou'].includes(t.target.unit) ? t.target.unit : 'mm') as LengthUnit;
    const flatness = r.result.leastSquares.flatnessMm;
    return {
      ...base,
      status: r.status,
      result: { value: fromMm(flatness, unit), unit, summary: `flatness ${show(flatness, unit)} over ${row.points.length} points; tilt ${r.result.tilt.mmPerMetre.toFixed(2)} mm/m` },
      recordId: row.id,
      recordedAt: r.recordedAt,
      ...(context.series && {
        series: {
          title: 'Heights about the fitted plane, row by row',
          x: { label: 'X position', unit: 'mm' },
          y: { label: 'Residual', unit },
          lines: rowsOf(r.result.points).map(([n, pts]) => ({ label: `Row ${n} (Y ${pts[0].yMm} mm)`, points: pts.map((p): [number, number] => [p.xMm, fromMm(p.residualMm, unit)]) })),
        },
      }),
    };
  }

  async resolve(workshopId: string, id: string) {
    const row = await this.repo.findBedGrid(workshopId, id);
    return row ? { machineId: row.machineId, recordType: BED_GRID, recordId: row.id, label: `Bed grid of ${row.recordedAt.toISOString().slice(0, 10)}` } : null;
  }

  private respond(row: BedGridRow, { target, base }: TargetOf, locked: boolean): BedGridResponse {
    const result = readableComputation(() => bedGridResult(row.points), BED_GRID_SHAPE);
    return toBedGridResponse(row, result, result ? judge(result.leastSquares.flatnessMm, base) : 'outside-target', target, locked);
  }
}

function rowsOf(points: BedGridPointResult[]): [number, BedGridPointResult[]][] {
  const byRow = new Map<number, BedGridPointResult[]>();
  for (const p of points) byRow.set(p.row, [...(byRow.get(p.row) ?? []), p]);
  return [...byRow.entries()].sort((a, b) => a[0] - b[0]).map(([n, pts]) => [n, pts.sort((a, b) => a.xMm - b.xMm)]);
}

const DECIMALS: Record<LengthUnit, number> = { mm: 3, um: 1, in: 4, thou: 2 };
const LABEL: Record<LengthUnit, string> = { mm: 'mm', um: 'µm', in: 'in', thou: 'thou' };
const show = (mm: number, unit: LengthUnit) => `${fromMm(mm, unit).toFixed(DECIMALS[unit])} ${LABEL[unit]}`;
