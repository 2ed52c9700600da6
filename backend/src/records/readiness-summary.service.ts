import { Injectable, Logger, NotFoundException, OnApplicationBootstrap, OnModuleInit } from '@nestjs/common';
import type { SQL } from 'drizzle-orm';
import { blockingOf, boardChecks } from '../approvals/board.js';
import type { BoardCheck } from '../approvals/snapshot.js';
import type { BlockingCheckRef, SummaryCheck } from '../database/schema/machine-readiness.js';
import type { MachineState } from '../database/schema/machines.js';
import { CHECK_KIND_NAMES, RECORD_TYPES } from './kinds.js';
import type { MachineRef, ReadinessCheck, ReadinessContext } from './readiness.js';
import { ReadinessRegistry } from './readiness.registry.js';
import { ReadinessSummaryRepository, type ReadinessContextRow } from './readiness-summary.repository.js';
import { RecordsService, type RecordChange } from './records.service.js';

/** Bump when the way checks are counted changes: every machine is recounted at the next start. */
// 2: every axis gained a backlash check, so every machine is counted again.
// 3: the summary keeps its checks, so that a recorded check asks only its own contributor again.
export const SUMMARY_VERSION = 3;

export interface ReadinessEvaluation {
  /** In the state it reads as now: "recheck-due" once the standing approval's date has passed. */
  machine: MachineRef & { name: string; state: MachineState };
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
    firstBlocking: first
      ? { key: first.key, kind: first.kind, subject: first.subject, status: first.status as BlockingCheckRef['status'] }
      : null,
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
      for (const m of await this.repo.missingOrOlder(this.countVersion())) await this.refresh(m.workshopId, m.id);
    } catch (err) {
      this.logger.error(`readiness summaries could not be brought up to date: ${(err as Error).message}`);
    }
  }

  /**
   * Every check of the machine with waivers applied. The machine, its target set and waivers come
   * from one statement; then each contributor's own reads (one query per kind of record).
   */
  async evaluate(workshopId: string, machineId: string, options: { series: boolean }): Promise<ReadinessEvaluation> {
    const found = await this.repo.context(workshopId, machineId, false);
    if (!found) throw new NotFoundException('No such machine in this workshop');
    const targetSet = targetSetOf(found);
    const checks = boardChecks(
      await this.registry.checksFor(found.machine, { targets: targetSet.targets, series: options.series }),
      found.waivers,
    );
    const interval = targetSet.targets.recheckIntervalDays;
    return {
      machine: found.machine,
      checks,
      blocking: blockingOf(checks),
      targetSet: { id: targetSet.id, name: targetSet.name, recheckIntervalDays: Math.round(interval?.value ?? 180) },
    };
  }

  /**
   * Recounts one machine into its summary row (in the current command's transaction, if any).
   * After a recorded check of a known kind only the contributor that reports that kind is asked
   * again; the other checks are taken from the stored summary. Anything else asks every contributor.
   */
  async refresh(workshopId: string, machineId: string, checkKind?: string): Promise<ReadinessCounts | null> {
    const only = checkKind ? this.registry.contributorsOf(checkKind) : [];
    // The contributors asked again send their first read with the context, when they offer one.
    const firstReads = only.map((index) => this.registry.firstReadOf(index, workshopId, machineId));
    const sendAlong = firstReads.every((read) => read !== undefined) ? (firstReads as SQL[]) : [];
    const found = await this.repo.context(workshopId, machineId, true, sendAlong);
    if (!found) return null;
    const context: ReadinessContext = { targets: targetSetOf(found).targets, series: false };
    const version = this.countVersion();
    const stored = found.summary?.version === version ? found.summary.checks : null;
    let checks: SummaryCheck[];
    if (only.length && stored) {
      const fresh = await Promise.all(
        only.map(async (index, k) =>
          (sendAlong.length
            ? await this.registry.checksFromFirstRead(index, found.firstReads[k], found.machine, context)
            : await this.registry.checksOf(index, found.machine, context)
          ).map((c) => summaryCheck(index, c)),
        ),
      );
      checks = [...stored.filter((c) => !only.includes(c.contributor)), ...fresh.flat()];
    } else {
      checks = (await this.registry.byContributor(found.machine, context)).flatMap((list, index) =>
        list.map((c) => summaryCheck(index, c)),
      );
    }
    const counts = countBoard(
      boardChecks(
        checks.map((c) => asReadinessCheck(c, machineId)),
        found.waivers,
      ),
    );
    await this.repo.upsert({ machineId, workshopId, ...counts, checks, version });
    return counts;
  }

  /**
   * The summary's version: the way of counting, the number of check kinds (records/kinds.ts) and
   * of contributors it was counted with, so a new check kind or contributor recounts every machine.
   */
  private countVersion(): number {
    return (SUMMARY_VERSION * 100 + CHECK_KIND_NAMES.length) * 1000 + this.registry.size;
  }

  /** Recounts the workshop's machines (those judged against one target set, when given). */
  async refreshWorkshop(workshopId: string, targetSetId?: string): Promise<void> {
    for (const id of await this.repo.machineIds(workshopId, targetSetId)) await this.refresh(workshopId, id);
  }

  private async changed(workshopId: string, change: RecordChange): Promise<void> {
    // Record types whose changes never move a machine's readiness (records/kinds.ts) ask for no recount.
    if (!RECORD_TYPES[change.recordType].readiness) return;
    if (change.machineId) {
      if (change.recordType === 'machine' && change.action === 'state-changed') return;
      await this.refresh(workshopId, change.machineId, change.checkKind);
      return;
    }
    // Changes that are not one machine's but judge many: a target set, the workshop's safety-walk items.
    if (change.recordType === 'target-set' && change.recordId) await this.refreshWorkshop(workshopId, change.recordId);
    else if (change.recordType === 'safety-item') await this.refreshWorkshop(workshopId);
  }
}

function targetSetOf(found: ReadinessContextRow): NonNullable<ReadinessContextRow['targetSet']> {
  if (!found.targetSet) throw new NotFoundException('No such target set in this workshop');
  return found.targetSet;
}

function summaryCheck(contributor: number, c: ReadinessCheck): SummaryCheck {
  return { contributor, key: c.key, kind: c.kind, subject: c.subject, status: c.status, recordId: c.recordId };
}

/** A stored check as the board counts it: waivers match on key and record, order on kind, subject and key. */
function asReadinessCheck(c: SummaryCheck, machineId: string): ReadinessCheck {
  return {
    key: c.key,
    kind: c.kind,
    subject: c.subject,
    status: c.status,
    recordId: c.recordId,
    target: null,
    result: null,
    recordType: null,
    recordedAt: null,
    place: { machineId, tab: 'readiness' },
  };
}
