import type { SubjectRef } from '../records/subjects.registry.js';
import { testCuts } from '../database/schema/index.js';
import { checkTable, type CheckRecords } from '../records/check-records.js';
import { CheckRecordsRepository } from '../records/check-records.repository.js';
import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import type { TestCutSizesMm } from '../database/schema/frame.js';
import { fromMm, toMm } from '../engine/units.js';
import { MachinesService } from '../machines/machines.service.js';
import type { CheckSeries, MachineRef, ReadinessCheck, ReadinessContext } from '../records/readiness.js';
import { RecordsService } from '../records/records.service.js';
import type { CreateTestCutDto } from './dto/create-test-cut.dto.js';
import { FrameTargets, frameTargetIn, type TargetOf } from './frame-targets.js';
import { toTestCutResponse, type FrameStatus, type TestCutResponse } from './frame.mapper.js';
import { afterKerf, testCutResult, type PartTolerancePolicy, type TestCutResult } from './test-cut-result.js';
import { readableComputation } from '../common/stored-result.js';
import { impossibleDiagonals } from './diagonal-check-result.js';
import { show, testCutWarnings } from './frame-warnings.js';

/** The numbers the readers of a test cut use, computed again from its stored sizes. */
const TEST_CUT_SHAPE = ['squareness.mmPerMetre', 'parts[]', 'parts[].deviationMm', 'parts[].toleranceMm'];
/** Widest kerf taken as a kerf rather than a typing slip (common practice: 0.03–0.08 in, far less than this). */
const MAX_KERF_MM = 25;

/** Plasma tables are judged by ISO 9013's bands; routers and other machines by the target as it stands. */
function policyFor(
  machine: Pick<MachineRef, 'kind'>,
  targetMm: number,
  plateThicknessMm: number | null,
): PartTolerancePolicy {
  return machine.kind === 'plasma'
    ? { basis: 'iso9013-class-2', targetMm, plateThicknessMm }
    : { basis: 'target', targetMm };
}

export const TEST_CUT = 'test-cut';
/** Where test cuts are kept: under their machine, newest by the time recorded. */
export const TEST_CUT_TABLE = checkTable({ type: TEST_CUT, table: testCuts, parent: 'machineId', time: 'recordedAt' });
export type TestCutRow = typeof testCuts.$inferSelect;
/** The list shows at most this many, newest first. */
const LISTED = 100;

interface TestCutTargets {
  part: TargetOf;
  squareness: TargetOf;
}

@Injectable()
export class TestCutsService {
  private readonly repo: CheckRecords<typeof testCuts>;

  constructor(
    checkRecords: CheckRecordsRepository,
    private readonly machines: MachinesService,
    private readonly targets: FrameTargets,
    private readonly records: RecordsService,
  ) {
    this.repo = checkRecords.of(TEST_CUT_TABLE);
  }

  async create(actor: SessionUser, machineId: string, dto: CreateTestCutDto): Promise<TestCutResponse> {
    const machine = await this.machines.getRef(actor, machineId);
    const unit = dto.lengthUnit ?? 'mm';
    const mm = (v: number) => toMm(v, unit);
    if (dto.measured.kerf != null && mm(dto.measured.kerf) > MAX_KERF_MM)
      throw new BadRequestException([`measured.kerf must be at most ${MAX_KERF_MM} mm (${show(MAX_KERF_MM, unit)})`]);
    const plateThicknessMm = dto.plateThickness == null ? null : mm(dto.plateThickness);
    const sizes: TestCutSizesMm = {
      nominal: { xMm: mm(dto.nominal.x), yMm: mm(dto.nominal.y), circleMm: mm(dto.nominal.circle) },
      measured: {
        xMm: mm(dto.measured.x),
        yMm: mm(dto.measured.y),
        diagonal1Mm: mm(dto.measured.diagonal1),
        diagonal2Mm: mm(dto.measured.diagonal2),
        circleXMm: mm(dto.measured.circleX),
        circleYMm: mm(dto.measured.circleY),
      },
      kerfMm: mm(dto.measured.kerf ?? 0),
      circleKind: dto.circleKind ?? 'hole',
      stepsPerMm: { x: dto.stepsPerMm?.x ?? null, y: dto.stepsPerMm?.y ?? null },
    };
    const m = afterKerf(sizes);
    const impossible = impossibleDiagonals({
      sideXMm: m.xMm,
      sideYMm: m.yMm,
      diagonal1Mm: m.diagonal1Mm,
      diagonal2Mm: m.diagonal2Mm,
      gantrySpanMm: null,
    });
    if (impossible.length)
      throw new BadRequestException(impossible.map((msg) => `measured.${msg.replace(/side([XY])/g, 'measured.$1')}`));
    const targets = await this.targetsOf(machine);
    // Evaluated before saving so input the engine refuses is never stored.
    testCutResult(sizes, policyFor(machine, targets.part.base, plateThicknessMm));
    const row = await this.repo.insert({
      workshopId: actor.workshopId,
      machineId: machine.id,
      lengthUnit: unit,
      plateThicknessMm,
      resolutionMm: dto.resolution == null ? null : mm(dto.resolution),
      sizes,
      note: dto.note?.trim() ?? '',
      recordedById: actor.id,
      recordedByName: actor.name,
    });
    const r = this.respond(row, machine, targets, false);
    await this.records.checkRecorded(
      actor,
      { machineId: machine.id, kind: TEST_CUT, recordType: TEST_CUT, recordId: row.id, status: r.status },
      `Test cut: scale X ${r.result!.scaleErrorX.toFixed(3)} %, Y ${r.result!.scaleErrorY.toFixed(3)} %, ${r.result!.squareness.mmPerMetre.toFixed(3)} mm/m out of square, ${r.status.replace('-', ' ')}`,
    );
    return r;
  }

  /** Removes a record entered by mistake; one an approval was based on is kept (409). */
  async remove(actor: SessionUser, machineId: string, id: string): Promise<void> {
    const machine = await this.machines.getRef(actor, machineId);
    const row = await this.repo.byId(actor.workshopId, id);
    if (!row || row.machineId !== machine.id) throw new NotFoundException('No such test cut on this machine');
    await this.records.assertEditable(TEST_CUT, row.id, 'This test cut');
    await this.repo.delete(actor.workshopId, row.id);
    await this.records.audit(actor, {
      machineId: machine.id,
      recordType: TEST_CUT,
      recordId: row.id,
      action: 'deleted',
      summary: `Test cut of ${row.recordedAt.toISOString().slice(0, 10)} by ${row.recordedByName} deleted`,
    });
  }

  async list(actor: SessionUser, machineId: string): Promise<TestCutResponse[]> {
    const machine = await this.machines.getRef(actor, machineId);
    const rows = await this.repo.newest(actor.workshopId, machine.id, LISTED);
    const locked = await this.records.lockedIds(
      TEST_CUT,
      rows.map((r) => r.id),
    );
    const targets = await this.targetsOf(machine);
    return rows.map((r) => this.respond(r, machine, targets, locked.has(r.id)));
  }

  async readiness(machine: MachineRef, context: ReadinessContext): Promise<ReadinessCheck> {
    const [row] = await this.repo.newest(machine.workshopId, machine.id, 1);
    const targets = { part: frameTargetIn(context, 'partTolerance'), squareness: frameTargetIn(context, 'squareness') };
    const base: ReadinessCheck = {
      key: `${TEST_CUT}:${machine.id}`,
      kind: TEST_CUT,
      subject: 'Test cut (part sizes and squareness)',
      status: 'not-started',
      target: targets.part.target,
      result: null,
      recordType: TEST_CUT,
      recordId: null,
      recordedAt: null,
      place: { machineId: machine.id, tab: 'frame' },
    };
    if (!row) return base;
    const r = this.respond(row, machine, targets, false);
    if (!r.result) {
      // A latest cut that cannot be read blocks like a failed one and says why.
      return {
        ...base,
        subject: `${base.subject} (latest test cut unreadable)`,
        status: 'outside-target',
        recordId: row.id,
        recordedAt: r.recordedAt,
      };
    }
    const u = row.lengthUnit;
    const worst = r.result.parts.reduce((w, p) => (Math.abs(p.deviationMm) > Math.abs(w.deviationMm) ? p : w));
    const outside = r.result.parts.filter((p) => !p.within).length;
    const plate = row.plateThicknessMm == null ? '' : ` in ${show(row.plateThicknessMm, u)} plate`;
    return {
      ...base,
      status: r.status,
      result: {
        value: fromMm(Math.abs(worst.deviationMm), u),
        unit: u,
        summary: `largest part size error ${show(Math.abs(worst.deviationMm), u)} (${worst.label.toLowerCase()}, ±${show(worst.toleranceMm, u)} allowed)${plate}${outside ? `; ${outside} of 4 outside their tolerance` : ''}; ${r.result.squareness.mmPerMetre.toFixed(3)} mm/m out of square`,
      },
      recordId: row.id,
      recordedAt: r.recordedAt,
      warnings: r.warnings,
      ...(context.series && { series: partTableSeries(r.result, u) }),
    };
  }

  async resolve(workshopId: string, id: string): Promise<SubjectRef | null> {
    const row = await this.repo.byId(workshopId, id);
    return row
      ? {
          machineId: row.machineId,
          recordType: TEST_CUT,
          recordId: row.id,
          label: `Test cut of ${row.recordedAt.toISOString().slice(0, 10)}`,
        }
      : null;
  }

  private async targetsOf(machine: MachineRef): Promise<TestCutTargets> {
    return {
      part: await this.targets.of(machine, 'partTolerance'),
      squareness: await this.targets.of(machine, 'squareness'),
    };
  }

  /** Within target only when every part size is within ± the part tolerance and the cut is square enough. */
  private respond(
    row: TestCutRow,
    machine: Pick<MachineRef, 'kind'>,
    targets: TestCutTargets,
    locked: boolean,
  ): TestCutResponse {
    const policy = policyFor(machine, targets.part.base, row.plateThicknessMm);
    const judgedBy = { part: targets.part.target, squareness: targets.squareness.target };
    const result = readableComputation(() => testCutResult(row.sizes, policy), TEST_CUT_SHAPE);
    if (!result) return toTestCutResponse(row, null, 'outside-target', judgedBy, locked, []);
    const within = result.parts.every((p) => p.within) && result.squareness.mmPerMetre <= targets.squareness.base;
    const status: FrameStatus = within ? 'within-target' : 'outside-target';
    const warnings = testCutWarnings(result, {
      policy,
      targetSource: targets.part.target.source,
      resolutionMm: row.resolutionMm,
      lengthUnit: row.lengthUnit,
    });
    return toTestCutResponse(row, result, status, judgedBy, locked, warnings);
  }
}

/**
 * The test cut's table for the certificate, in the cut's lengthUnit. Lines come in pairs, one pair
 * per part in the order outside X, outside Y, circle X, circle Y:
 * - line 2k, label = the part ("Outside size in X"): one point [nominal size, deviation after kerf];
 * - line 2k + 1, label = "±<tolerance> <unit>: <where the tolerance comes from>": two points
 *   [nominal, −tolerance] and [nominal, +tolerance], a bar a chart can draw behind the deviation.
 * A table reads: part, nominal (x of either line), deviation (y of line 2k), tolerance (y of the
 * second point of line 2k + 1), basis (label of line 2k + 1).
 */
export function partTableSeries(r: TestCutResult, u: TestCutRow['lengthUnit']): CheckSeries {
  const at = (mm: number) => fromMm(mm, u);
  return {
    title: 'Test-cut part sizes after kerf: deviation and tolerance',
    x: { label: 'Nominal size', unit: u },
    y: { label: 'Deviation from nominal', unit: u },
    lines: r.parts.flatMap((p) => [
      { label: p.label, points: [[at(p.nominalMm), at(p.deviationMm)]] as [number, number][] },
      {
        label: `±${show(p.toleranceMm, u)}: ${p.toleranceBasis}`,
        points: [
          [at(p.nominalMm), -at(p.toleranceMm)],
          [at(p.nominalMm), at(p.toleranceMm)],
        ] as [number, number][],
      },
    ]),
  };
}
