import { BadRequestException, ConflictException, Injectable, NotFoundException, OnModuleInit } from '@nestjs/common';
import { fromMm, toMm, type LengthUnit } from '../engine/units.js';
import type { SessionUser } from '../auth/session-user.js';
import { APPROVED_STATES, type MachineState } from '../database/schema/machines.js';
import type { MachineRef } from '../records/readiness.js';
import { ReadinessSummaryService } from '../records/readiness-summary.service.js';
import { RecordsService } from '../records/records.service.js';
import { SubjectsRegistry } from '../records/subjects.registry.js';
import { TargetSetsService } from '../target-sets/target-sets.service.js';
import {
  toListChecks,
  toMachineResponse,
  type MachineListItem,
  type MachineResponse,
  type MachineRow,
} from './machine.mapper.js';
import { MachinesRepository } from './machines.repository.js';
import type { CreateMachineDto } from './dto/create-machine.dto.js';
import type { UpdateMachineDto } from './dto/update-machine.dto.js';
import type { HistoryQueryDto } from '../history/dto/history-query.dto.js';

/**
 * Refuses (409) a change to what a standing approval was based on, for a command that locked the
 * machine's row itself (in the statement that read its own record, one round trip less).
 */
export function refuseWhileApproved(machine: { name: string; state: MachineState }): void {
  if (APPROVED_STATES.includes(machine.state)) {
    throw new ConflictException(
      `${machine.name} is approved as ready to cut: what the approval stands on is read-only while it stands. The owner can reopen the machine with a reason to change it.`,
    );
  }
}

@Injectable()
export class MachinesService implements OnModuleInit {
  constructor(
    private readonly repo: MachinesRepository,
    private readonly targetSets: TargetSetsService,
    private readonly records: RecordsService,
    private readonly readiness: ReadinessSummaryService,
    private readonly subjects: SubjectsRegistry,
  ) {}

  onModuleInit() {
    this.subjects.register('machine', async (workshopId, id) => {
      const found = await this.repo.find(workshopId, id);
      return found ? { machineId: id, recordType: 'machine', recordId: id, label: found.machine.name } : null;
    });
  }

  /**
   * Served from each machine's readiness summary (kept current by every change's transaction),
   * so the list costs one statement however much history the machines have. A machine without
   * a summary (made by hand in the database) is counted once here and keeps its summary. A
   * machine whose re-check date has passed reads as re-check due; the list writes nothing for it.
   */
  async list(actor: SessionUser): Promise<MachineListItem[]> {
    const rows = await this.repo.list(actor.workshopId);
    const out: MachineListItem[] = [];
    for (const { machine, targetSetName, readiness } of rows) {
      const counts =
        readiness?.total == null ? await this.readiness.refresh(machine.workshopId, machine.id) : readiness;
      out.push({ ...toMachineResponse(machine, targetSetName), checks: toListChecks(counts!) });
    }
    return out;
  }

  async get(actor: SessionUser, id: string): Promise<MachineResponse> {
    const found = await this.repo.find(actor.workshopId, id);
    if (!found) throw new NotFoundException('No such machine in this workshop');
    return toMachineResponse(found.machine, found.targetSetName);
  }

  /** The machine as other modules need it; another workshop's machine is a 404. */
  async getRef(
    actor: SessionUser | { workshopId: string },
    id: string,
  ): Promise<MachineRef & { name: string; state: MachineState }> {
    const found = await this.repo.find(actor.workshopId, id);
    if (!found) throw new NotFoundException('No such machine in this workshop');
    return { ...toRef(found.machine), name: found.machine.name, state: found.machine.state };
  }

  /**
   * The machine for a command that changes its state: its row is locked until the command
   * commits, so two requests, approvals or server instances act on it one after the other.
   */
  async lockForCommand(actor: SessionUser, id: string): Promise<MachineRef & { name: string; state: MachineState }> {
    const row = await this.repo.lock(actor.workshopId, id);
    if (!row) throw new NotFoundException('No such machine in this workshop');
    return { ...toRef(row), name: row.name, state: row.state };
  }

  /**
   * Like lockForCommand, for a command that changes the machine's record: refused (409) while an
   * approval stands. The database refuses such writes anyway; this says so before other checks.
   */
  async lockForChange(actor: SessionUser, id: string): Promise<MachineRef & { name: string; state: MachineState }> {
    const machine = await this.lockForCommand(actor, id);
    refuseWhileApproved(machine);
    return machine;
  }

  async create(actor: SessionUser, dto: CreateMachineDto): Promise<MachineResponse> {
    const sets = await this.targetSets.ensureDefaults(actor.workshopId);
    let targetSetId = dto.targetSetId;
    if (targetSetId) await this.targetSets.findRow(actor.workshopId, targetSetId);
    else
      targetSetId = (
        sets.find((s) => s.name.toLowerCase().startsWith(dto.kind === 'router' ? 'router' : 'plasma')) ?? sets[0]
      ).id;
    const row = await this.repo.insert({
      workshopId: actor.workshopId,
      name: dto.name.trim(),
      kind: dto.kind,
      ...workAreaMm(dto.workArea, dto.lengthUnit ?? 'mm'),
      lengthUnit: dto.lengthUnit ?? 'mm',
      notes: dto.notes ?? '',
      targetSetId,
    });
    await this.records.audit(actor, {
      machineId: row.id,
      recordType: 'machine',
      recordId: row.id,
      action: 'created',
      summary: `Machine file ${row.name} opened`,
    });
    return this.get(actor, row.id);
  }

  async update(actor: SessionUser, id: string, dto: UpdateMachineDto): Promise<MachineResponse> {
    const before = await this.get(actor, id);
    if (dto.targetSetId) await this.targetSets.findRow(actor.workshopId, dto.targetSetId);
    await this.repo.update(actor.workshopId, id, {
      name: dto.name?.trim(),
      kind: dto.kind,
      ...(dto.workArea ? workAreaMm(dto.workArea, dto.lengthUnit ?? before.lengthUnit) : {}),
      lengthUnit: dto.lengthUnit,
      notes: dto.notes,
      targetSetId: dto.targetSetId,
    });
    const after = await this.get(actor, id);
    await this.records.audit(actor, {
      machineId: id,
      recordType: 'machine',
      recordId: id,
      action: 'updated',
      summary: `Machine file ${after.name} changed`,
      changes: diff(before, after),
    });
    return after;
  }

  /** Used by approvals to move the machine between states. */
  async setState(workshopId: string, id: string, state: MachineState): Promise<void> {
    await this.repo.update(workshopId, id, { state });
  }

  /** The machine's history, a page at a time, filtered. */
  async history(actor: SessionUser, id: string, query: HistoryQueryDto) {
    await this.getRef(actor, id);
    return this.records.history(actor.workshopId, query, id);
  }
}

function toRef(m: MachineRow): MachineRef {
  return {
    id: m.id,
    workshopId: m.workshopId,
    targetSetId: m.targetSetId,
    kind: m.kind,
    workAreaXMm: m.workAreaXMm,
    workAreaYMm: m.workAreaYMm,
  };
}

function diff(before: MachineResponse, after: MachineResponse): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const key of ['name', 'kind', 'notes', 'workArea', 'targetSet'] as const) {
    if (JSON.stringify(before[key]) !== JSON.stringify(after[key])) out[key] = { from: before[key], to: after[key] };
  }
  return out;
}

/** The work area in mm, refused (400 naming the field) outside 1 mm to 100 m whatever unit it was typed in. */
function workAreaMm(area: { x: number; y: number }, unit: LengthUnit): { workAreaXMm: number; workAreaYMm: number } {
  const x = toMm(area.x, unit);
  const y = toMm(area.y, unit);
  const problems = (['x', 'y'] as const)
    .filter((k) => !({ x, y }[k] >= 1 && { x, y }[k] <= 100_000))
    .map(
      (k) =>
        `workArea.${k} must be between 1 mm and 100 m (${fromMm(1, unit).toPrecision(3)} to ${+fromMm(100_000, unit).toPrecision(6)} ${unit})`,
    );
  if (problems.length) throw new BadRequestException(problems);
  return { workAreaXMm: x, workAreaYMm: y };
}
