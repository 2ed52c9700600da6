import type { SubjectRef } from '../records/subjects.registry.js';
import { diagonalChecks } from '../database/schema/index.js';
import { checkTable, type CheckRecords } from '../records/check-records.js';
import { CheckRecordsRepository } from '../records/check-records.repository.js';
import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { toMm } from '../engine/units.js';
import { MachinesService } from '../machines/machines.service.js';
import type { MachineRef, ReadinessCheck, ReadinessContext } from '../records/readiness.js';
import { RecordsService } from '../records/records.service.js';
import { diagonalCheckResult, impossibleDiagonals, type DiagonalInputMm } from './diagonal-check-result.js';
import type { CreateDiagonalCheckDto } from './dto/create-diagonal-check.dto.js';
import { FrameTargets, frameTargetIn, judge, type TargetOf } from './frame-targets.js';
import { toDiagonalCheckResponse, type DiagonalCheckResponse } from './frame.mapper.js';
import { readableComputation } from '../common/stored-result.js';
import { diagonalWarnings } from './frame-warnings.js';

/** The numbers the readers of a diagonal check use, computed again from its stored lengths. */
const DIAGONAL_SHAPE = ['mmPerMetre', 'outOfSquareArcsec', 'correction.moveMm'];
const storedDiagonal = (row: DiagonalCheckRow) => readableComputation(() => diagonalCheckResult(row), DIAGONAL_SHAPE);

export const DIAGONAL_CHECK = 'diagonal-check';
/** Where diagonal checks are kept: under their machine, newest by the time recorded. */
export const DIAGONAL_CHECK_TABLE = checkTable({
  type: DIAGONAL_CHECK,
  table: diagonalChecks,
  parent: 'machineId',
  time: 'recordedAt',
});
export type DiagonalCheckRow = typeof diagonalChecks.$inferSelect;
/** The list shows at most this many, newest first. */
const LISTED = 200;

@Injectable()
export class DiagonalChecksService {
  private readonly repo: CheckRecords<typeof diagonalChecks>;

  constructor(
    checkRecords: CheckRecordsRepository,
    private readonly machines: MachinesService,
    private readonly targets: FrameTargets,
    private readonly records: RecordsService,
  ) {
    this.repo = checkRecords.of(DIAGONAL_CHECK_TABLE);
  }

  async create(actor: SessionUser, machineId: string, dto: CreateDiagonalCheckDto): Promise<DiagonalCheckResponse> {
    const machine = await this.machines.getRef(actor, machineId);
    const unit = dto.lengthUnit ?? 'mm';
    const input: DiagonalInputMm = {
      sideXMm: toMm(dto.sideX, unit),
      sideYMm: toMm(dto.sideY, unit),
      diagonal1Mm: toMm(dto.diagonal1, unit),
      diagonal2Mm: toMm(dto.diagonal2, unit),
      gantrySpanMm: dto.gantrySpan == null ? null : toMm(dto.gantrySpan, unit),
    };
    const impossible = impossibleDiagonals(input);
    if (impossible.length) throw new BadRequestException(impossible);
    // Evaluated before saving so input the engine refuses is never stored.
    diagonalCheckResult(input);
    const row = await this.repo.insert({
      workshopId: actor.workshopId,
      machineId: machine.id,
      lengthUnit: unit,
      resolutionMm: dto.resolution == null ? null : toMm(dto.resolution, unit),
      ...input,
      note: dto.note?.trim() ?? '',
      recordedById: actor.id,
      recordedByName: actor.name,
    });
    const response = this.respond(row, await this.targets.of(machine, 'squareness'), false);
    await this.records.checkRecorded(
      actor,
      {
        machineId: machine.id,
        kind: DIAGONAL_CHECK,
        recordType: DIAGONAL_CHECK,
        recordId: row.id,
        status: response.status,
      },
      `Diagonal check: ${response.result!.mmPerMetre.toFixed(3)} mm/m out of square (${response.result!.outOfSquareArcsec.toFixed(0)}″), ${response.status.replace('-', ' ')}`,
    );
    return response;
  }

  /** Removes a record entered by mistake; one an approval was based on is kept (409). */
  async remove(actor: SessionUser, machineId: string, id: string): Promise<void> {
    const machine = await this.machines.getRef(actor, machineId);
    const row = await this.repo.byId(actor.workshopId, id);
    if (!row || row.machineId !== machine.id) throw new NotFoundException('No such diagonal check on this machine');
    await this.records.assertEditable(DIAGONAL_CHECK, row.id, 'This diagonal check');
    await this.repo.delete(actor.workshopId, row.id);
    await this.records.audit(actor, {
      machineId: machine.id,
      recordType: DIAGONAL_CHECK,
      recordId: row.id,
      action: 'deleted',
      summary: `Diagonal check of ${row.recordedAt.toISOString().slice(0, 10)} by ${row.recordedByName} deleted`,
    });
  }

  async list(actor: SessionUser, machineId: string): Promise<DiagonalCheckResponse[]> {
    const machine = await this.machines.getRef(actor, machineId);
    const rows = await this.repo.newest(actor.workshopId, machine.id, LISTED);
    const locked = await this.records.lockedIds(
      DIAGONAL_CHECK,
      rows.map((r) => r.id),
    );
    const target = await this.targets.of(machine, 'squareness');
    return rows.map((r) => this.respond(r, target, locked.has(r.id)));
  }

  async readiness(machine: MachineRef, context: ReadinessContext): Promise<ReadinessCheck> {
    // The squaring history is read only for the certificate's chart; the board needs the newest check.
    const rows = await this.repo.newest(machine.workshopId, machine.id, context.series ? 30 : 1);
    const row = rows[0];
    const t = frameTargetIn(context, 'squareness');
    const { target } = t;
    const base: ReadinessCheck = {
      key: `${DIAGONAL_CHECK}:${machine.id}`,
      kind: DIAGONAL_CHECK,
      subject: 'Gantry squareness (diagonals)',
      status: 'not-started',
      target,
      result: null,
      recordType: DIAGONAL_CHECK,
      recordId: null,
      recordedAt: null,
      place: { machineId: machine.id, tab: 'frame' },
      warnings: [],
    };
    if (!row) return base;
    const r = this.respond(row, t, false);
    if (!r.result) {
      // A latest check that cannot be read blocks like a failed one and says why.
      return {
        ...base,
        subject: `${base.subject} (latest diagonal check unreadable)`,
        status: 'outside-target',
        result: null,
        recordId: row.id,
        recordedAt: r.recordedAt,
      };
    }
    return {
      ...base,
      status: r.status,
      result: {
        value: r.result.mmPerMetre,
        unit: 'mm/m',
        summary: `${r.result.mmPerMetre.toFixed(3)} mm/m out of square; move one side ${r.result.correction.moveMm.toFixed(2)} mm`,
      },
      recordId: row.id,
      recordedAt: r.recordedAt,
      warnings: r.warnings,
      // The squaring history, oldest first, for the certificate's chart.
      ...(context.series && {
        series: {
          title: 'Squaring history',
          x: { label: 'Check', unit: '#' },
          y: { label: 'Out of square', unit: 'mm/m' },
          lines: [
            {
              label: 'Out of square',
              points: [...rows].reverse().flatMap((x, i): [number, number][] => {
                const result = storedDiagonal(x);
                return result ? [[i + 1, result.mmPerMetre]] : [];
              }),
            },
          ],
          limits: [{ label: `Target ${t.target.value} mm/m`, value: t.base }],
        },
      }),
    };
  }

  async resolve(workshopId: string, id: string): Promise<SubjectRef | null> {
    const row = await this.repo.byId(workshopId, id);
    return row
      ? {
          machineId: row.machineId,
          recordType: DIAGONAL_CHECK,
          recordId: row.id,
          label: `Diagonal check of ${row.recordedAt.toISOString().slice(0, 10)}`,
        }
      : null;
  }

  private respond(row: DiagonalCheckRow, { target, base }: TargetOf, locked: boolean): DiagonalCheckResponse {
    const result = storedDiagonal(row);
    const warnings = result ? diagonalWarnings(row, result.warnings, base, row.resolutionMm, row.lengthUnit) : [];
    return toDiagonalCheckResponse(
      row,
      result,
      result ? judge(result.mmPerMetre, base) : 'outside-target',
      target,
      locked,
      warnings,
    );
  }
}
