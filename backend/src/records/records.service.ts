import { BadRequestException, ConflictException, Injectable, Logger } from '@nestjs/common';
import type { SQL } from 'drizzle-orm';
import type { SessionUser } from '../auth/session-user.js';
import {
  assignChanges,
  decodeCursor,
  encodeCursor,
  toHistoryEntry,
  type HistoryPage,
} from '../history/history.mapper.js';
import type { HistoryQueryDto } from '../history/dto/history-query.dto.js';
import { isRecordType, RECORD_TYPE_NAMES, type CheckKind, type RecordType, type SignedRecordType } from './kinds.js';
import type { CheckStatus } from './readiness.js';
import { RecordsRepository, type CheckInsert } from './records.repository.js';

/** The refusal for a change to a record that an approval was based on. */
export function lockedRecordConflict(what = 'This record'): ConflictException {
  return new ConflictException(
    `${what} is part of an approved commissioning record and can no longer be changed or deleted. Record a new check instead.`,
  );
}

/** Who an audit entry names: a signed-in person, or (for a failed sign-in) nobody known. */
export type AuditActor = Pick<SessionUser, 'workshopId' | 'name'> & { id: string | null };

const DEFAULT_PAGE = 50;
const DATE_ONLY = /^\d{4}-\d{2}-\d{2}$/;

export interface AuditInput {
  machineId?: string | null;
  recordType: RecordType;
  recordId?: string | null;
  action: string;
  summary: string;
  changes?: Record<string, unknown>;
  /** For a recorded check: its readiness kind (not stored), so only the contributor reporting it is asked again. */
  checkKind?: CheckKind;
}

export interface CheckRecordedEvent {
  machineId: string;
  kind: CheckKind;
  recordType: SignedRecordType;
  recordId: string;
  status: CheckStatus;
}

type Listener = (actor: SessionUser, event: CheckRecordedEvent) => Promise<void>;

/** What an audited change touched: enough to know whose readiness may have moved. */
export type RecordChange = Pick<AuditInput, 'machineId' | 'recordType' | 'recordId' | 'action' | 'checkKind'>;
type ChangeListener = (workshopId: string, change: RecordChange) => Promise<void>;

/**
 * What every record of a machine goes through: the audit history, the approval locks, and the
 * "a check was recorded" signal (the machine's last activity, and approvals reacting to it).
 */
@Injectable()
export class RecordsService {
  private readonly logger = new Logger(RecordsService.name);
  private readonly listeners: Listener[] = [];
  private readonly changeListeners: ChangeListener[] = [];

  constructor(private readonly repo: RecordsRepository) {}

  async audit(actor: AuditActor, input: AuditInput): Promise<void> {
    const values = auditValues(actor, input);
    if (input.machineId) await this.repo.insertAuditAndTouch({ ...values, machineId: input.machineId });
    else await this.repo.insertAudit(values);
    await this.changed(actor.workshopId, input);
  }

  // After the machine's touch: that row lock makes commands on one machine take turns, so each
  // listener (the readiness summary) reads what the command before it committed.
  private async changed(workshopId: string, input: AuditInput): Promise<void> {
    const change: RecordChange = {
      machineId: input.machineId ?? null,
      recordType: input.recordType,
      recordId: input.recordId ?? null,
      action: input.action,
      checkKind: input.checkKind,
    };
    for (const listener of this.changeListeners) await listener(workshopId, change);
  }

  /** Runs in the changing command's transaction after every audited change; a failure fails the command. */
  onRecordChanged(listener: ChangeListener): void {
    this.changeListeners.push(listener);
  }

  /** Call after saving a check's result: audits it and lets approvals react (e.g. leave ready-to-cut). */
  async checkRecorded(actor: SessionUser, event: CheckRecordedEvent, summary: string): Promise<void> {
    await this.audit(actor, recordedEntry(event, summary));
    await this.tellCheckListeners(actor, event);
  }

  /**
   * Saves a check's record together with its audit entry and the machine's last activity, in one
   * statement (`record` is its table and row; see RecordsRepository.insertWithAuditAndTouch), then
   * reacts as checkRecorded does. Answers the new record's id, or null when the insert wrote
   * nothing (the id was taken).
   */
  async saveCheck(
    actor: SessionUser,
    record: CheckInsert,
    event: Omit<CheckRecordedEvent, 'recordId'>,
    summary: string,
  ): Promise<string | null> {
    const entry = recordedEntry({ ...event, recordId: null }, summary);
    const recordId = await this.repo.insertWithAuditAndTouch(record, {
      ...auditValues(actor, entry),
      machineId: event.machineId,
    });
    if (!recordId) return null;
    await this.changed(actor.workshopId, { ...entry, recordId });
    await this.tellCheckListeners(actor, { ...event, recordId });
    return recordId;
  }

  /**
   * A change's audit entry and the machine's last activity, to be sent inside the command's own
   * write statement as common table expressions, written only if the expression `when` yields a
   * row. Call `auditedAlong` once that statement has written.
   */
  auditAlong(actor: AuditActor, input: AuditInput & { machineId: string }, when: string): SQL {
    return this.repo.auditAndTouchAfter(when, { ...auditValues(actor, input), machineId: input.machineId });
  }

  /** After a write that carried its audit entry (auditAlong): what audit() does once the entry is written. */
  auditedAlong(actor: AuditActor, input: AuditInput): Promise<void> {
    return this.changed(actor.workshopId, input);
  }

  private async tellCheckListeners(actor: SessionUser, event: CheckRecordedEvent): Promise<void> {
    for (const listener of this.listeners) {
      try {
        await listener(actor, event);
      } catch (err) {
        this.logger.error(`check listener failed: ${(err as Error).message}`);
      }
    }
  }

  onCheckRecorded(listener: Listener): void {
    this.listeners.push(listener);
  }

  /** Refuses (409) a change to a record that an approval was based on. */
  async assertEditable(recordType: SignedRecordType, recordId: string, what = 'This record'): Promise<void> {
    if (await this.repo.lockOf(recordType, recordId)) throw lockedRecordConflict(what);
  }

  lockedIds(recordType: SignedRecordType, recordIds: string[]): Promise<Set<string>> {
    return this.repo.lockedIds(recordType, recordIds);
  }

  lock(approvalId: string, refs: { recordType: SignedRecordType; recordId: string }[]): Promise<void> {
    return this.repo.insertLocks(approvalId, refs);
  }

  /**
   * A page of the workshop's history (or one machine's), newest first, each summary with the
   * values its command changed. A date without a time in `to` includes that whole day (UTC).
   */
  async history(workshopId: string, query: HistoryQueryDto, machineId?: string): Promise<HistoryPage> {
    const after = query.cursor ? decodeCursor(query.cursor) : undefined;
    if (after === null) throw new BadRequestException(['cursor must be the nextCursor of an earlier page']);
    const from = query.from ? new Date(query.from) : undefined;
    const toExclusive = query.to
      ? DATE_ONLY.test(query.to)
        ? new Date(Date.parse(query.to) + 86_400_000)
        : new Date(Date.parse(query.to) + 1)
      : undefined;
    if (from && toExclusive && from >= toExclusive) throw new BadRequestException(['from must be before to']);
    if (query.kind && !isRecordType(query.kind))
      throw new BadRequestException([`kind must be one of ${RECORD_TYPE_NAMES.join(', ')}`]);
    const limit = query.limit ?? DEFAULT_PAGE;
    const rows = await this.repo.historyPage(workshopId, {
      machineId,
      recordType: query.kind as RecordType | undefined,
      person: query.person?.trim() || undefined,
      from,
      toExclusive,
      after,
      limit,
    });
    const page = rows.slice(0, limit);
    const txids = [...new Set(page.map((r) => r.txid))];
    const [txEntries, changes] = await Promise.all([
      this.repo.entriesOfTransactions(workshopId, txids),
      this.repo.changesOfTransactions(workshopId, txids),
    ]);
    const assigned = assignChanges(txEntries, changes);
    return {
      entries: page.map((r) => toHistoryEntry(r, assigned.get(r.id) ?? [])),
      nextCursor: rows.length > limit ? encodeCursor(page[page.length - 1]) : null,
    };
  }
}

/** The audit entry of a recorded check. */
function recordedEntry(
  event: Omit<CheckRecordedEvent, 'recordId'> & { recordId: string | null },
  summary: string,
): AuditInput & { changes: Record<string, unknown> } {
  return {
    machineId: event.machineId,
    recordType: event.recordType,
    recordId: event.recordId,
    action: 'recorded',
    summary,
    changes: { status: event.status },
    checkKind: event.kind,
  };
}

/** The audit row of a change made by `actor`. */
function auditValues(actor: AuditActor, input: AuditInput) {
  return {
    workshopId: actor.workshopId,
    machineId: input.machineId ?? null,
    recordType: input.recordType,
    recordId: input.recordId ?? null,
    action: input.action,
    summary: input.summary,
    changes: input.changes ?? null,
    actorId: actor.id,
    actorName: actor.name,
  };
}
