import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { evaluateStraightness, type ReferenceLineResult } from '../engine/straightness.js';
import { arrayToMm, toMm } from '../engine/units.js';
import {
  judgedStraightnessMm,
  referenceOf,
  REFERENCE_WORDS,
  showIn,
  slopeOf,
  warningsForSweep,
} from './sweep-judgement.js';
import type { StoredLine, StoredSweepResult } from '../database/schema/rails.js';
import { MachinesService } from '../machines/machines.service.js';
import { RecordsService } from '../records/records.service.js';
import { targetInBaseUnit } from '../target-sets/target-keys.js';
import { TargetSetsService } from '../target-sets/target-sets.service.js';
import { toSweepListItem, toSweepResponse, type SweepListItem, type SweepResponse } from './rail.mapper.js';
import { DEFAULT_PAGE_SIZE } from '../records/page-cursor.js';
import type { PageQuery } from '../records/page.query.js';
import { RailsRepository, type SweepRow, type SweepValues } from './rails.repository.js';
import { RailsService } from './rails.service.js';
import type { CreateSweepDto } from './dto/create-sweep.dto.js';
import type { UpdateSweepDetailsDto } from './dto/update-sweep-details.dto.js';

/** The details a correction may change; the readings, units, face, phase and time make the result and stay. */
const DETAIL_FIELDS = ['instrument', 'temperatureC', 'takenBy', 'boltSize', 'torqueNm', 'datum', 'notes'] as const;
type DetailField = (typeof DETAIL_FIELDS)[number];

const line = (r: ReferenceLineResult): StoredLine => ({
  slope: r.slope,
  intercept: r.interceptMm,
  straightness: r.straightnessMm,
  residuals: r.residualsMm,
});

/** Rail sweeps: readings along a rail, fitted by the engine and stored with their result. */
@Injectable()
export class RailSweepsService {
  constructor(
    private readonly repo: RailsRepository,
    private readonly rails: RailsService,
    private readonly machines: MachinesService,
    private readonly targetSets: TargetSetsService,
    private readonly records: RecordsService,
  ) {}

  /** A page of the rail's sweeps, newest first, summaries only; `nextCursor` asks for the page after. */
  async list(
    actor: SessionUser,
    railId: string,
    query: PageQuery = {},
  ): Promise<{ items: SweepListItem[]; nextCursor: string | null }> {
    await this.rails.findRow(actor, railId);
    const limit = query.limit ?? DEFAULT_PAGE_SIZE;
    const rows = await this.repo.sweepPage(actor.workshopId, railId, query.cursor ?? null, limit);
    const page = rows.slice(0, limit);
    const locked = await this.records.lockedIds(
      'rail-sweep',
      page.map((r) => r.id),
    );
    const last = page[page.length - 1];
    return {
      items: page.map((r) => toSweepListItem(r, locked.has(r.id))),
      nextCursor: rows.length > limit ? last.id : null,
    };
  }

  async get(actor: SessionUser, id: string): Promise<SweepResponse> {
    const row = await this.findRow(actor, id);
    return toSweepResponse(row, (await this.records.lockedIds('rail-sweep', [id])).has(id));
  }

  /**
   * Saves a sweep; a repeat of the same client id answers the sweep already saved
   * (`created: false`) and changes nothing.
   */
  async record(
    actor: SessionUser,
    railId: string,
    dto: CreateSweepDto,
  ): Promise<{ created: boolean; sweep: SweepResponse }> {
    const found = await this.repo.findRailForSweep(actor.workshopId, railId);
    if (!found) throw new NotFoundException('No such rail in this workshop');
    const { rail, targets } = found;
    if (dto.id) {
      const existing = await this.repeatOf(actor, railId, dto.id);
      if (existing) return { created: false, sweep: existing };
    }
    checkStations(dto);
    const takenAt = dto.takenAt ? new Date(dto.takenAt) : new Date();
    if (takenAt.getTime() > Date.now() + 5 * 60_000)
      throw new BadRequestException(['takenAt must not be in the future']);

    const readingUnit = dto.readingUnit ?? 'mm';
    const lengthUnit = dto.lengthUnit ?? 'mm';
    const positionsMm = arrayToMm(
      dto.stations.map((s) => s.position),
      lengthUnit,
    );
    checkPositionsMm(positionsMm, lengthUnit);
    const readingsRaw = dto.stations.map((s) => s.reading);
    const readingsMm = arrayToMm(readingsRaw, readingUnit);
    const fitted = evaluateStraightness({ positionsMm, readingsMm });
    const target = targets.railStraightness;
    const reference = referenceOf(target);
    const result: StoredSweepResult = {
      leastSquares: line(fitted.leastSquares),
      minimumZone: line(fitted.minimumZone),
      endPoint: line(fitted.endPoint),
    };
    const slope = slopeOf(positionsMm, result, reference);
    result.localSlope = { mmPerM: slope.mmPerM, fromMm: slope.fromMm, toMm: slope.toMm, baseMm: slope.baseMm };
    const judged = judgedStraightnessMm(result, reference);
    const status = judged <= targetInBaseUnit(target) ? 'within-target' : 'outside-target';
    const resolutionMm = dto.resolution === undefined ? null : toMm(dto.resolution, readingUnit);
    const warnings = warningsForSweep(
      {
        stationCount: positionsMm.length,
        resolutionMm,
        readingUnit,
        spanMm: Math.max(...positionsMm) - Math.min(...positionsMm),
      },
      rail.lengthMm,
      target,
      lengthUnit,
    );

    const now = new Date();
    const values: SweepValues = {
      ...(dto.id ? { id: dto.id } : {}),
      workshopId: actor.workshopId,
      machineId: rail.machineId,
      railId,
      readingUnit,
      lengthUnit,
      face: dto.face ?? 'side',
      positionsMm,
      readingsRaw,
      readingsMm,
      instrument: dto.instrument?.trim() ?? '',
      resolution: dto.resolution ?? null,
      temperatureC: dto.temperatureC ?? null,
      phase: dto.phase,
      takenBy: dto.takenBy?.trim() || actor.name,
      boltSize: dto.boltSize ?? null,
      torqueNm: dto.torqueNm ?? null,
      datum: dto.datum?.trim() || null,
      notes: dto.notes ?? '',
      result,
      warnings,
      status,
      target: { value: target.value, unit: target.unit, reference },
      createdById: actor.id,
      takenAt,
      createdAt: now,
    };
    const id = await this.records.saveCheck(
      actor,
      this.repo.sweepRecord(values),
      { machineId: rail.machineId, kind: 'rail-straightness', recordType: 'rail-sweep', status },
      `Sweep of rail ${rail.label} (${dto.phase}, ${values.face} face): ${REFERENCE_WORDS[reference]} ${showIn(judged, readingUnit)} against a target of ${target.value} ${target.unit === 'um' ? 'µm' : target.unit}` +
        ` (least squares ${showIn(result.leastSquares.straightness, readingUnit)}, minimum zone ${showIn(result.minimumZone.straightness, readingUnit)}); largest local slope ${slope.mmPerM.toFixed(3)} mm/m`,
    );
    if (!id) {
      // Two copies of one save raced; the first one won.
      const existing = await this.repeatOf(actor, railId, dto.id!);
      if (existing) return { created: false, sweep: existing };
      throw new ConflictException('That sweep id is already used by another record');
    }
    const row = this.repo.sweepRowOf(values, id);
    return { created: true, sweep: toSweepResponse(row, false) };
  }

  /**
   * Corrects a sweep's details (datum, notes, instrument, who, bolts, temperature) while no
   * approval stands on it: the machine locked first, the old and new values in the audit row.
   */
  async updateDetails(actor: SessionUser, id: string, dto: UpdateSweepDetailsDto): Promise<SweepResponse> {
    const before = await this.findRow(actor, id);
    await this.machines.lockForChange(actor, before.machineId);
    await this.records.assertEditable('rail-sweep', id, 'This sweep');
    const set: Partial<Pick<SweepRow, DetailField>> = {};
    const from: Record<string, unknown> = {};
    const to: Record<string, unknown> = {};
    for (const field of DETAIL_FIELDS) {
      const value = dto[field];
      if (value === undefined) continue;
      // An empty datum is no datum, as when the sweep was recorded.
      const next = field === 'datum' && value === '' ? null : value;
      if (next === before[field]) continue;
      (set as Record<string, unknown>)[field] = next;
      from[field] = before[field];
      to[field] = next;
    }
    if (!Object.keys(set).length) return this.get(actor, id);
    const row = await this.repo.updateSweepDetails(actor.workshopId, id, set);
    if (!row) throw new NotFoundException('No such sweep in this workshop');
    const rail = await this.rails.findRow(actor, row.railId);
    const words = Object.keys(set)
      .map((f) =>
        f === 'notes' ? 'notes rewritten' : `${f} ${JSON.stringify(from[f] ?? '')} → ${JSON.stringify(to[f] ?? '')}`,
      )
      .join(', ');
    // The audit row keeps the old and new values whole; the summary names them for people.
    await this.records.audit(actor, {
      machineId: row.machineId,
      recordType: 'rail-sweep',
      recordId: id,
      action: 'updated',
      summary:
        `Sweep of rail ${rail.label} of ${row.takenAt.toISOString().slice(0, 10)}: details corrected (${words})`.slice(
          0,
          2000,
        ),
      changes: { before: from, after: to },
    });
    return toSweepResponse(row, false);
  }

  async remove(actor: SessionUser, id: string): Promise<void> {
    const row = await this.findRow(actor, id);
    await this.records.assertEditable('rail-sweep', id, 'This sweep');
    await this.repo.deleteSweep(actor.workshopId, id);
    await this.records.audit(actor, {
      machineId: row.machineId,
      recordType: 'rail-sweep',
      recordId: id,
      action: 'deleted',
      summary: `Sweep of ${row.takenAt.toISOString().slice(0, 10)} (${row.phase}) deleted`,
    });
  }

  private async findRow(actor: SessionUser, id: string): Promise<SweepRow> {
    const row = await this.repo.findSweep(actor.workshopId, id);
    if (!row) throw new NotFoundException('No such sweep in this workshop');
    return row;
  }

  private async repeatOf(actor: SessionUser, railId: string, id: string): Promise<SweepResponse | null> {
    const row = await this.repo.findSweep(actor.workshopId, id);
    if (row && row.railId === railId) return this.get(actor, id);
    if (row || (await this.repo.sweepIdTaken(id)))
      throw new ConflictException('That sweep id is already used by another record');
    return null;
  }
}

/** Names the first bad station so the person can find it on the indicator sheet. */
function checkStations(dto: CreateSweepDto) {
  const seen = new Map<number, number>();
  const problems: string[] = [];
  dto.stations.forEach((s, i) => {
    const first = seen.get(s.position);
    if (first !== undefined)
      problems.push(
        `stations.${i}.position repeats ${s.position} ${dto.lengthUnit ?? 'mm'} (also at stations.${first})`,
      );
    else seen.set(s.position, i);
  });
  if (problems.length) throw new BadRequestException(problems);
}

/** Positions are bounded in mm whatever unit they were typed in. */
function checkPositionsMm(positionsMm: number[], unit: string) {
  const i = positionsMm.findIndex((p) => Math.abs(p) > 20_000);
  if (i >= 0)
    throw new BadRequestException([`stations.${i}.position must be within ±20 000 mm along the rail (in ${unit})`]);
}
