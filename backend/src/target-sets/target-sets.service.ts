import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { STRAIGHTNESS_REFERENCES, type TargetValue } from '../database/schema/target-sets.js';
import { RecordsService } from '../records/records.service.js';
import { DEFAULT_TARGET_SETS } from './default-target-sets.js';
import { TARGET_KEYS, TARGET_UNIT_KIND, targetInBaseUnit, type TargetKey } from './target-keys.js';
import {
  toTargetSetResponse,
  toTargetSetUser,
  type TargetSetResponse,
  type TargetSetRow,
  type TargetSetUser,
} from './target-set.mapper.js';
import { TargetSetsRepository } from './target-sets.repository.js';
import type { CreateTargetSetDto, UpdateTargetSetDto } from './dto/target-set.dto.js';

// Height difference scales with rail spacing (K in µm per mm); a plain length is still read as stored.
const UNITS_BY_KIND = {
  length: ['mm', 'um', 'in', 'thou'],
  'mm/m': ['mm/m'],
  '%': ['%'],
  days: ['days'],
  'per-spacing': ['um/mm', 'mm', 'um', 'in', 'thou'],
} as const;

@Injectable()
export class TargetSetsService {
  constructor(
    private readonly repo: TargetSetsRepository,
    private readonly records: RecordsService,
  ) {}

  /** A workshop always has the two default sets to start from. */
  async ensureDefaults(workshopId: string): Promise<TargetSetRow[]> {
    const existing = await this.repo.list(workshopId);
    if (existing.length) return existing;
    for (const set of DEFAULT_TARGET_SETS) await this.repo.insert(workshopId, set);
    return this.repo.list(workshopId);
  }

  async list(actor: SessionUser): Promise<TargetSetResponse[]> {
    const [rows, users] = await Promise.all([this.ensureDefaults(actor.workshopId), this.usersBySet(actor.workshopId)]);
    return rows.map((row) => toTargetSetResponse(row, users.get(row.id)));
  }

  async get(actor: SessionUser, id: string): Promise<TargetSetResponse> {
    const [row, users] = await Promise.all([this.findRow(actor.workshopId, id), this.usersBySet(actor.workshopId)]);
    return toTargetSetResponse(row, users.get(id));
  }

  private async usersBySet(workshopId: string): Promise<Map<string, TargetSetUser[]>> {
    const out = new Map<string, TargetSetUser[]>();
    for (const m of await this.repo.machinesUsing(workshopId))
      out.set(m.targetSetId, [...(out.get(m.targetSetId) ?? []), toTargetSetUser(m)]);
    return out;
  }

  async findRow(workshopId: string, id: string): Promise<TargetSetRow> {
    const row = await this.repo.find(workshopId, id);
    if (!row) throw new NotFoundException('No such target set in this workshop');
    return row;
  }

  /** The target a check is judged against, in mm for lengths (other kinds as stored). */
  async targetFor(
    workshopId: string,
    targetSetId: string,
    key: TargetKey,
  ): Promise<{ target: TargetValue; base: number }> {
    const row = await this.findRow(workshopId, targetSetId);
    const target = row.targets[key];
    return { target, base: targetInBaseUnit(target) };
  }

  async create(actor: SessionUser, dto: CreateTargetSetDto): Promise<TargetSetResponse> {
    const targets = checkTargets(dto.targets, true);
    const row = await this.repo.insert(actor.workshopId, {
      name: dto.name.trim(),
      description: dto.description ?? '',
      targets,
    });
    await this.records.audit(actor, {
      recordType: 'target-set',
      recordId: row.id,
      action: 'created',
      summary: `Target set ${row.name} created`,
    });
    return toTargetSetResponse(row);
  }

  async update(actor: SessionUser, id: string, dto: UpdateTargetSetDto): Promise<TargetSetResponse> {
    const current = await this.findRow(actor.workshopId, id);
    const targets = dto.targets ? { ...current.targets, ...checkTargets(dto.targets, false) } : undefined;
    const row = await this.repo.update(actor.workshopId, id, {
      name: dto.name?.trim(),
      description: dto.description,
      targets,
    });
    await this.records.audit(actor, {
      recordType: 'target-set',
      recordId: id,
      action: 'updated',
      summary: `Target set ${row.name} changed`,
      changes: { before: current.targets, after: row.targets },
    });
    return toTargetSetResponse(row, (await this.usersBySet(actor.workshopId)).get(id));
  }
}

/** Validates each entry and names the first bad one; with `complete`, every key is required. */
function checkTargets(input: Record<string, Partial<TargetValue>>, complete: boolean): Record<string, TargetValue> {
  const out: Record<string, TargetValue> = {};
  const problems: string[] = [];
  for (const [key, t] of Object.entries(input)) {
    if (!(TARGET_KEYS as readonly string[]).includes(key)) {
      problems.push(`targets.${key} is not a known target (known: ${TARGET_KEYS.join(', ')})`);
      continue;
    }
    const allowed = UNITS_BY_KIND[TARGET_UNIT_KIND[key as TargetKey]] as readonly string[];
    if (!t || typeof t !== 'object') problems.push(`targets.${key} must be an object {value, unit}`);
    else if (typeof t.value !== 'number' || !Number.isFinite(t.value) || t.value < 0)
      problems.push(`targets.${key}.value must be a number of 0 or more`);
    else if (!t.unit || !allowed.includes(t.unit))
      problems.push(`targets.${key}.unit must be one of ${allowed.join(', ')}`);
    else if (t.source !== undefined && (typeof t.source !== 'string' || t.source.length > 500))
      problems.push(`targets.${key}.source must be text of at most 500 characters`);
    else if (
      t.reference !== undefined &&
      (key !== 'railStraightness' || !(STRAIGHTNESS_REFERENCES as readonly string[]).includes(t.reference))
    )
      problems.push(
        key === 'railStraightness'
          ? `targets.${key}.reference must be one of ${STRAIGHTNESS_REFERENCES.join(', ')}`
          : `targets.${key}.reference is read on railStraightness only`,
      );
    else
      out[key] = {
        value: t.value,
        unit: t.unit,
        ...(t.source ? { source: t.source } : {}),
        ...(t.reference ? { reference: t.reference } : {}),
      };
  }
  if (complete) for (const key of TARGET_KEYS) if (!(key in input)) problems.push(`targets.${key} is required`);
  if (problems.length) throw new BadRequestException(problems);
  return out;
}
