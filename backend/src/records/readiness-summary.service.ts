import { Injectable, Logger, NotFoundException, OnApplicationBootstrap, OnModuleInit } from '@nestjs/common';
import { blockingOf, boardChecks } from '../approvals/board.js';
import type { BoardCheck } from '../approvals/snapshot.js';
import type { BlockingCheckRef } from '../database/schema/machine-readiness.js';
import type { MachineRef, ReadinessContext } from './readiness.js';
import { ReadinessRegistry } from './readiness.registry.js';
import { ReadinessSummaryRepository } from './readiness-summary.repository.js';
import { RecordsService, type RecordChange } from './records.service.js';

/** Bump when the way checks are counted changes: every machine is recounted at the next start. */
// 2: every axis gained a backlash check, so every machine is counted again.
export const SUMMARY_VERSION = 2;

/** Record types whose changes never move a machine's readiness (no refresh for them). */
const NO_READINESS_EFFECT = new Set(['evidence', 'bolt-down', 'approval', 'sign-in', 'person', 'password-link']);

export interface ReadinessEvaluation {
  checks: BoardCheck[];
  blocking: BoardCheck[];
  targetSet: { id: string; name: string; recheckIntervalDays: number };
}

export interface ReadinessCounts {
  total: number;
  notStarted: number;
  within: number;
  outside: number;
  waived: number;
  firstBlocking: BlockingCheckRef | null;
}

/** Counts by the board's status (waivers applied); the first blocking check in board order. */
export function countBoard(checks: BoardCheck[]): ReadinessCounts {
  const count = (status: BoardCheck['status']) => checks.filter((c) => c.status === status).length;
  const first = blockingOf(checks)[0];
  return {
    total: checks.length,
    notStarted: count('not-started'),
    within: count('within-target'),
    outside: count('outside-target'),
    waived: count('waived'),
    firstBlocking: first ? { key: first.key, kind: first.kind, subject: first.subject, status: first.status as BlockingCheckRef['status'] } : null,
  };
}

/**
 * A machine's readiness as the board shows it, and the per-machine summary the machines list
 * reads. The summary is recounted inside the transaction of every command that records,
 * deletes, waives or edits something a machine is judged on (RecordsService's record-changed
 * signal, raised by every audited change), so it commits or rolls back with that change.
 */
@Injectable()
export class ReadinessSummaryService implements OnModuleInit, OnApplicationBootstrap {
  private readonly logger = new Logger(ReadinessSummaryService.name);

  constructor(
    private readonly repo: ReadinessSummaryRepository,
    private readonly registry: ReadinessRegistry,
    private readonly records: RecordsService,
  ) {}

  onModuleInit() {
    this.records.onRecordChanged((workshopId, change) => this.changed(workshopId, change));
  }

  /** Machines made before the summary existed (or counted an older way) are counted at start. */
  async onApplicationBootstrap() {
    try {
      for (const m of await this.repo.missingOrOlder(SUMMARY_VERSION)) await this.refresh(m.workshopId, m.id);
    } catch (err) {
      this.logger.error(`readiness summaries could not be brought up to date: ${(err as Error).message}`);
    }
  }

  /** Every check of the machine with waivers applied; the target set is read once for all contributors. */
  async evaluate(machine: MachineRef, options: { series: boolean }): Promise<ReadinessEvaluation> {
    const [targetSet, waivers] = await Promise.all([this.repo.targetSet(machine.workshopId, machine.targetSetId), this.repo.waivers(machine.workshopId, machine.id)]);
    if (!targetSet) throw new NotFoundException('No such target set in this workshop');
    const context: ReadinessContext = { targets: targetSet.targets, series: options.series };
    const checks = boardChecks(await this.registry.checksFor(machine, context), waivers);
    const interval = targetSet.targets.recheckIntervalDays;
    return {
      checks,
      blocking: blockingOf(checks),
      targetSet: { id: targetSet.id, name: targetSet.name, recheckIntervalDays: Math.round(interval?.value ?? 180) },
    };
  }

  /** Recounts one machine into its summary row (in the current command's transaction, if any). */
  async refresh(workshopId: string, machineId: string): Promise<ReadinessCounts | null> {
    const machine = await this.repo.machine(workshopId, machineId);
    if (!machine) return null;
    const counts = countBoard((await this.evaluate(machine, { series: false })).checks);
    await this.repo.upsert({ machineId, workshopId, ...counts, version: SUMMARY_VERSION });
    return counts;
  }

  /** Recounts the workshop's machines (those judged against one target set, when given). */
  async refreshWorkshop(workshopId: string, targetSetId?: string): Promise<void> {
    for (const id of await this.repo.machineIds(workshopId, targetSetId)) await this.refresh(workshopId, id);
  }

  private async changed(workshopId: string, change: RecordChange): Promise<void> {
    if (NO_READINESS_EFFECT.has(change.recordType)) return;
    if (change.machineId) {
      if (change.recordType === 'machine' && change.action === 'state-changed') return;
      await this.refresh(workshopId, change.machineId);
      return;
    }
    // Changes that are not one machine's but judge many: a target set, the workshop's safety-walk items.
    if (change.recordType === 'target-set' && change.recordId) await this.refreshWorkshop(workshopId, change.recordId);
    else if (change.recordType === 'safety-item') await this.refreshWorkshop(workshopId);
  }
}
