import { ConflictException, Injectable, NotFoundException, OnModuleInit } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { MachinesService } from '../machines/machines.service.js';
import type { MachineRef, ReadinessCheck } from '../records/readiness.js';
import { ReadinessRegistry } from '../records/readiness.registry.js';
import { RecordsService } from '../records/records.service.js';
import { SubjectsRegistry } from '../records/subjects.registry.js';
import { BUILT_IN_ITEMS, SECTION_LABELS } from './built-in-items.js';
import type { AnswerItemDto } from './dto/answer-item.dto.js';
import type { CreateSafetyItemDto } from './dto/create-safety-item.dto.js';
import { toSafetyItemResponse, toWalkResponse, type SafetyWalkResponse, type WalkItem } from './safety.mapper.js';
import { SafetyRepository, type SafetyAnswerRow } from './safety.repository.js';

export const SAFETY_WALK = 'safety-walk';
const ANSWER_WORDS = { yes: 'yes', no: 'no', na: 'not applicable' } as const;

@Injectable()
export class SafetyService implements OnModuleInit {
  constructor(
    private readonly repo: SafetyRepository,
    private readonly machines: MachinesService,
    private readonly records: RecordsService,
    private readonly readinessRegistry: ReadinessRegistry,
    private readonly subjects: SubjectsRegistry,
  ) {}

  onModuleInit() {
    this.readinessRegistry.register({ checksFor: async (machine) => [await this.readiness(machine)] });
    // Evidence (a photo of the E-stop test) attaches to one answered item of a machine's walk.
    this.subjects.register('safety-item', async (workshopId, id) => {
      const found = await this.repo.findAnswer(workshopId, id);
      if (!found) return null;
      const item = (await this.items(workshopId)).find((i) => i.id === found.answer.itemKey);
      return {
        machineId: found.walk.machineId,
        recordType: SAFETY_WALK,
        recordId: found.walk.id,
        label: item?.text ?? 'Safety-walk item',
      };
    });
  }

  async items(workshopId: string): Promise<WalkItem[]> {
    const own = await this.repo.workshopItems(workshopId);
    return [
      ...BUILT_IN_ITEMS.map((i) => ({ ...i, builtIn: true })),
      ...own.map((r) => ({ id: r.id, section: r.section, text: r.text, builtIn: false })),
    ];
  }

  async listItems(actor: SessionUser) {
    const own = await this.repo.workshopItems(actor.workshopId);
    return {
      builtIn: BUILT_IN_ITEMS.map((i) => ({ ...i, builtIn: true })),
      workshop: own.map(toSafetyItemResponse),
      sections: Object.entries(SECTION_LABELS).map(([id, label]) => ({ id, label })),
    };
  }

  async addItem(actor: SessionUser, dto: CreateSafetyItemDto) {
    const row = await this.repo.insertItem({
      workshopId: actor.workshopId,
      section: dto.section,
      text: dto.text.trim(),
      createdById: actor.id,
      createdByName: actor.name,
    });
    await this.records.audit(actor, {
      recordType: 'safety-item',
      recordId: row.id,
      action: 'created',
      summary: `Safety-walk item added (${SECTION_LABELS[row.section]}): ${row.text}`,
    });
    return toSafetyItemResponse(row);
  }

  async walk(actor: SessionUser, machineId: string): Promise<SafetyWalkResponse> {
    const machine = await this.machines.getRef(actor, machineId);
    return this.walkOf(machine);
  }

  async answer(actor: SessionUser, machineId: string, itemId: string, dto: AnswerItemDto): Promise<SafetyWalkResponse> {
    const machine = await this.machines.getRef(actor, machineId);
    const items = await this.items(actor.workshopId);
    const item = items.find((i) => i.id === itemId);
    if (!item) throw new NotFoundException('No such safety-walk item in this workshop');
    const walk =
      (await this.repo.currentWalk(actor.workshopId, machine.id)) ??
      (await this.repo.insertWalk(actor.workshopId, machine.id));
    await this.records.assertEditable(SAFETY_WALK, walk.id, 'This safety walk');
    await this.repo.upsertAnswer({
      walkId: walk.id,
      itemKey: item.id,
      answer: dto.answer,
      note: dto.note?.trim() ?? '',
      answeredById: actor.id,
      answeredByName: actor.name,
    });
    const response = await this.walkOf(machine);
    await this.records.checkRecorded(
      actor,
      { machineId: machine.id, kind: SAFETY_WALK, recordType: SAFETY_WALK, recordId: walk.id, status: response.status },
      `Safety walk: "${item.text}" answered ${ANSWER_WORDS[dto.answer]}${dto.note?.trim() ? ` (${dto.note.trim()})` : ''}; ${response.counts.answered} of ${response.counts.total} answered`,
    );
    return response;
  }

  /** Starts a fresh walk (for a re-check, or once an approved walk is locked); the old one is kept. */
  async startNew(actor: SessionUser, machineId: string): Promise<SafetyWalkResponse> {
    const machine = await this.machines.getRef(actor, machineId);
    const current = await this.repo.currentWalk(actor.workshopId, machine.id);
    if (current && !(await this.repo.answers(current.id)).length)
      throw new ConflictException('The current safety walk has no answers yet; answer it instead of starting another.');
    const walk = await this.repo.insertWalk(actor.workshopId, machine.id);
    await this.records.audit(actor, {
      machineId: machine.id,
      recordType: SAFETY_WALK,
      recordId: walk.id,
      action: 'started',
      summary: 'A new safety walk was started',
    });
    return this.walkOf(machine);
  }

  async readiness(machine: MachineRef): Promise<ReadinessCheck> {
    const walk = await this.walkOf(machine);
    const c = walk.counts;
    return {
      key: `${SAFETY_WALK}:${machine.id}`,
      kind: SAFETY_WALK,
      subject: 'Safety walk (every item answered, none "no")',
      status: walk.status,
      // A checklist has no tolerance: the rule is in the subject.
      target: null,
      result: c.answered
        ? {
            value: c.answered,
            unit: 'items',
            summary: `${c.answered} of ${c.total} answered${c.no ? `; ${c.no} answered no (blocks approval)` : ''}`,
          }
        : null,
      recordType: SAFETY_WALK,
      recordId: walk.id,
      recordedAt: latestAnswerAt(walk),
      place: { machineId: machine.id, tab: 'safety' },
    };
  }

  private async walkOf(machine: MachineRef): Promise<SafetyWalkResponse> {
    const items = await this.items(machine.workshopId);
    const walk = await this.repo.currentWalk(machine.workshopId, machine.id);
    const answers = new Map<string, SafetyAnswerRow>();
    if (walk) for (const a of await this.repo.answers(walk.id)) answers.set(a.itemKey, a);
    const locked = walk ? (await this.records.lockedIds(SAFETY_WALK, [walk.id])).has(walk.id) : false;
    return toWalkResponse(machine.id, walk, items, answers, locked);
  }
}

function latestAnswerAt(walk: SafetyWalkResponse): string | null {
  const times = walk.sections.flatMap((s) => s.items.map((i) => i.answer?.answeredAt).filter((t): t is string => !!t));
  return times.length ? times.sort().at(-1)! : null;
}
