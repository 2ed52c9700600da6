import { Inject, Injectable } from '@nestjs/common';
import { and, asc, desc, eq, getTableColumns, inArray, isNull, lte, sql } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import {
  approvalRequests,
  approvals,
  axes,
  machines,
  rails,
  users,
  waivers,
  workshops,
} from '../database/schema/index.js';
import { APPROVED_STATES } from '../database/schema/machines.js';

export type WaiverRow = typeof waivers.$inferSelect;
export type ApprovalRow = typeof approvals.$inferSelect;
export type RequestRow = typeof approvalRequests.$inferSelect;

@Injectable()
export class ApprovalsRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  waivers(workshopId: string, machineId: string): Promise<WaiverRow[]> {
    return this.db
      .select()
      .from(waivers)
      .where(and(eq(waivers.workshopId, workshopId), eq(waivers.machineId, machineId)))
      .orderBy(desc(waivers.waivedAt));
  }

  async insertWaiver(values: typeof waivers.$inferInsert): Promise<WaiverRow> {
    const [row] = await this.db.insert(waivers).values(values).returning();
    return row;
  }

  async openRequest(workshopId: string, machineId: string): Promise<RequestRow | null> {
    const [row] = await this.openRequestQuery(workshopId, machineId);
    return row ?? null;
  }

  async insertRequest(values: typeof approvalRequests.$inferInsert): Promise<RequestRow> {
    const [row] = await this.db.insert(approvalRequests).values(values).returning();
    return row;
  }

  async closeOpenRequests(workshopId: string, machineId: string): Promise<void> {
    await this.db
      .update(approvalRequests)
      .set({ status: 'closed' })
      .where(
        and(
          eq(approvalRequests.workshopId, workshopId),
          eq(approvalRequests.machineId, machineId),
          eq(approvalRequests.status, 'open'),
        ),
      );
  }

  /**
   * Stores the approval only if its request is still open (the command's transaction holds the
   * machine's row, and the database allows one standing approval). null when the request was taken first.
   */
  async insertApproval(requestId: string, values: typeof approvals.$inferInsert): Promise<ApprovalRow | null> {
    const taken = await this.db
      .update(approvalRequests)
      .set({ status: 'approved' })
      .where(and(eq(approvalRequests.id, requestId), eq(approvalRequests.status, 'open')))
      .returning({ id: approvalRequests.id });
    if (!taken.length) return null;
    const [row] = await this.db.insert(approvals).values(values).returning();
    return row;
  }

  /** The approval that stands (not reopened), if any. */
  async standingApproval(workshopId: string, machineId: string): Promise<ApprovalRow | null> {
    const [row] = await this.db
      .select()
      .from(approvals)
      .where(and(eq(approvals.workshopId, workshopId), eq(approvals.machineId, machineId), isNull(approvals.endedAt)))
      .limit(1);
    return row ?? null;
  }

  async endApproval(
    id: string,
    values: Pick<typeof approvals.$inferInsert, 'endedAt' | 'endedById' | 'endedByName' | 'endReason'>,
  ): Promise<ApprovalRow> {
    const [row] = await this.db.update(approvals).set(values).where(eq(approvals.id, id)).returning();
    return row;
  }

  async setSignature(
    id: string,
    values: Pick<typeof approvals.$inferInsert, 'signature' | 'signingKeyId' | 'signedContent'>,
  ): Promise<ApprovalRow> {
    const [row] = await this.db.update(approvals).set(values).where(eq(approvals.id, id)).returning();
    return row;
  }

  /** The machine's rails and axes: their geometry and drive settings are part of what is approved. */
  async partsOf(machineId: string): Promise<{ recordType: 'rail' | 'axis'; recordId: string }[]> {
    const [railRows, axisRows] = await Promise.all([
      this.db.select({ id: rails.id }).from(rails).where(eq(rails.machineId, machineId)),
      this.db.select({ id: axes.id }).from(axes).where(eq(axes.machineId, machineId)),
    ]);
    return [
      ...railRows.map((r) => ({ recordType: 'rail' as const, recordId: r.id })),
      ...axisRows.map((a) => ({ recordType: 'axis' as const, recordId: a.id })),
    ];
  }

  /** The standing approval if there is one, else the newest (times are kept to the second, so two may tie). */
  async latestApproval(workshopId: string, machineId: string): Promise<ApprovalRow | null> {
    const [row] = await this.latestApprovalQuery(workshopId, machineId);
    return row ?? null;
  }

  /**
   * The latest approval and the open request of a machine in one statement (the readiness page
   * shows both): each is at most one row, joined on true, so either may be missing.
   */
  async latestApprovalAndOpenRequest(
    workshopId: string,
    machineId: string,
  ): Promise<{ approval: ApprovalRow | null; request: RequestRow | null }> {
    const latest = this.latestApprovalQuery(workshopId, machineId).as('latest');
    const open = this.openRequestQuery(workshopId, machineId).as('open');
    const fieldsOf = <T extends Record<string, unknown>>(columns: T, alias: Record<string, unknown>) =>
      Object.fromEntries(Object.keys(columns).map((key) => [key, alias[key]])) as T;
    const [row] = await this.db
      .select({
        approval: fieldsOf(getTableColumns(approvals), latest as unknown as Record<string, unknown>),
        request: fieldsOf(getTableColumns(approvalRequests), open as unknown as Record<string, unknown>),
      })
      .from(latest)
      .fullJoin(open, sql`true`);
    return {
      approval: (row?.approval as ApprovalRow | null | undefined) ?? null,
      request: (row?.request as RequestRow | null | undefined) ?? null,
    };
  }

  private latestApprovalQuery(workshopId: string, machineId: string) {
    return this.db
      .select()
      .from(approvals)
      .where(and(eq(approvals.workshopId, workshopId), eq(approvals.machineId, machineId)))
      .orderBy(sql`${approvals.endedAt} is null desc`, desc(approvals.approvedAt), desc(approvals.endedAt))
      .limit(1);
  }

  private openRequestQuery(workshopId: string, machineId: string) {
    return this.db
      .select()
      .from(approvalRequests)
      .where(
        and(
          eq(approvalRequests.workshopId, workshopId),
          eq(approvalRequests.machineId, machineId),
          eq(approvalRequests.status, 'open'),
        ),
      )
      .orderBy(desc(approvalRequests.requestedAt))
      .limit(1);
  }

  async approval(workshopId: string, machineId: string, approvalId: string): Promise<ApprovalRow | null> {
    const [row] = await this.db
      .select()
      .from(approvals)
      .where(
        and(eq(approvals.workshopId, workshopId), eq(approvals.machineId, machineId), eq(approvals.id, approvalId)),
      );
    return row ?? null;
  }

  listApprovals(workshopId: string, machineId: string): Promise<ApprovalRow[]> {
    return this.db
      .select()
      .from(approvals)
      .where(and(eq(approvals.workshopId, workshopId), eq(approvals.machineId, machineId)))
      .orderBy(desc(approvals.approvedAt));
  }

  /**
   * Standing approvals whose re-check date has passed and whose reminder has not gone out, of
   * every workshop, with their machine's name. Read only by the re-check reminder job.
   */
  dueRecheckReminders(now: Date) {
    return this.db
      .select({ approval: approvals, machineName: machines.name })
      .from(approvals)
      .innerJoin(machines, eq(machines.id, approvals.machineId))
      .where(
        and(
          isNull(approvals.endedAt),
          isNull(approvals.recheckNotifiedAt),
          lte(approvals.recheckDueAt, now),
          inArray(machines.state, [...APPROVED_STATES]),
        ),
      )
      .orderBy(asc(approvals.recheckDueAt));
  }

  /** True for the one caller that marks the re-check mail as sent (a standing approval, once). */
  async markRecheckNotified(approvalId: string, now: Date): Promise<boolean> {
    const rows = await this.db
      .update(approvals)
      .set({ recheckNotifiedAt: now })
      .where(
        and(
          eq(approvals.id, approvalId),
          isNull(approvals.recheckNotifiedAt),
          isNull(approvals.endedAt),
          lte(approvals.recheckDueAt, now),
        ),
      )
      .returning({ id: approvals.id });
    return rows.length > 0;
  }

  /** Active members of the workshop, for addressing mail. */
  members(workshopId: string) {
    return this.db
      .select({ id: users.id, email: users.email, name: users.name, role: users.role })
      .from(users)
      .where(and(eq(users.workshopId, workshopId), eq(users.active, true)))
      .orderBy(asc(users.name));
  }

  async workshopName(workshopId: string): Promise<string> {
    const [row] = await this.db.select({ name: workshops.name }).from(workshops).where(eq(workshops.id, workshopId));
    return row?.name ?? '';
  }
}
