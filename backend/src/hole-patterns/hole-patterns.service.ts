import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { MachinesService } from '../machines/machines.service.js';
import { RecordsService } from '../records/records.service.js';
import { toHolePatternResponse, type HolePatternResponse, type PatternPreviewResponse } from './hole-pattern.mapper.js';
import { HolePatternsRepository, type HolePatternRow, type HolePatternValues } from './hole-patterns.repository.js';
import { resolvePattern, type ResolvedPattern } from './pattern-entry.js';
import type { HolePatternDto } from './dto/hole-pattern.dto.js';

const RECORD_TYPE = 'hole-pattern';

/**
 * Drilling patterns of a machine. They are a shop aid for marking out, not evidence an approval
 * stands on, so they stay editable while an approval stands (no lock check, no database guard);
 * every change is still audited in the command's transaction.
 */
@Injectable()
export class HolePatternsService {
  constructor(
    private readonly repo: HolePatternsRepository,
    private readonly machines: MachinesService,
    private readonly records: RecordsService,
  ) {}

  async list(actor: SessionUser, machineId: string): Promise<HolePatternResponse[]> {
    await this.machines.getRef(actor, machineId);
    return (await this.repo.list(actor.workshopId, machineId)).map(toHolePatternResponse);
  }

  async get(actor: SessionUser, id: string): Promise<HolePatternResponse> {
    return toHolePatternResponse(await this.findRow(actor, id));
  }

  async findRow(actor: SessionUser, id: string): Promise<HolePatternRow> {
    const row = await this.repo.find(actor.workshopId, id);
    if (!row) throw new NotFoundException('No such hole pattern in this workshop');
    return row;
  }

  /** The holes a pattern would have, for the live preview; nothing is saved. */
  preview(dto: HolePatternDto): PatternPreviewResponse {
    const p = resolveOrRefuse(dto);
    return { widthMm: p.widthMm, heightMm: p.heightMm, holes: p.holes };
  }

  async create(actor: SessionUser, machineId: string, dto: HolePatternDto): Promise<HolePatternResponse> {
    await this.machines.getRef(actor, machineId);
    const row = await this.repo.insert(actor.workshopId, machineId, valuesOf(dto, resolveOrRefuse(dto)));
    await this.records.audit(actor, {
      machineId,
      recordType: RECORD_TYPE,
      recordId: row.id,
      action: 'created',
      summary: `Hole pattern ${row.name} (${row.holes.length} holes) added`,
    });
    return toHolePatternResponse(row);
  }

  async update(actor: SessionUser, id: string, dto: HolePatternDto): Promise<HolePatternResponse> {
    const before = await this.findRow(actor, id);
    const row = await this.repo.update(actor.workshopId, id, valuesOf(dto, resolveOrRefuse(dto)));
    await this.records.audit(actor, {
      machineId: row.machineId,
      recordType: RECORD_TYPE,
      recordId: id,
      action: 'updated',
      summary: `Hole pattern ${row.name} changed`,
      changes: changes(before, row),
    });
    return toHolePatternResponse(row);
  }

  async remove(actor: SessionUser, id: string): Promise<void> {
    const row = await this.findRow(actor, id);
    await this.repo.delete(actor.workshopId, id);
    await this.records.audit(actor, {
      machineId: row.machineId,
      recordType: RECORD_TYPE,
      recordId: id,
      action: 'deleted',
      summary: `Hole pattern ${row.name} removed`,
    });
  }
}

function resolveOrRefuse(dto: HolePatternDto): ResolvedPattern {
  const { pattern, problems } = resolvePattern(dto);
  if (!pattern) throw new BadRequestException(problems);
  return pattern;
}

function valuesOf(dto: HolePatternDto, p: ResolvedPattern): HolePatternValues {
  return {
    name: dto.name.trim(),
    reference: dto.reference,
    lengthUnit: dto.lengthUnit ?? 'mm',
    widthMm: p.widthMm,
    heightMm: p.heightMm,
    entry: p.entry,
    holes: p.holes,
    notes: dto.notes?.trim() ?? '',
  };
}

function changes(before: HolePatternRow, after: HolePatternRow): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const key of ['name', 'reference', 'lengthUnit', 'widthMm', 'heightMm', 'entry', 'notes'] as const) {
    if (JSON.stringify(before[key]) !== JSON.stringify(after[key])) out[key] = { from: before[key], to: after[key] };
  }
  if (before.holes.length !== after.holes.length) out.holeCount = { from: before.holes.length, to: after.holes.length };
  return out;
}
