import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { DRIZZLE, type Database } from '../../src/database/database.tokens.js';
import { approvals, machines, targetSets, users, workshops } from '../../src/database/schema/index.js';
import type { SignedRecordType } from '../../src/records/kinds.js';
import { RecordsService } from '../../src/records/records.service.js';

/**
 * Locks records as an approval would, for specs that test a lock without going through a whole
 * approval. A lock must name an approval that exists (record_locks.approval_id is a foreign key):
 * this one belongs to a machine of a workshop of its own and has ended, so no machine of the
 * spec reads as approved and nothing else the spec looks at changes.
 */
export async function lockAsApproved(
  app: NestFastifyApplication,
  refs: { recordType: SignedRecordType; recordId: string }[],
): Promise<string> {
  const db = app.get<Database>(DRIZZLE);
  const tag = randomUUID().slice(0, 8);
  const [ws] = await db
    .insert(workshops)
    .values({ name: `Stand-in approvals ${tag}` })
    .returning();
  const [owner] = await db
    .insert(users)
    .values({
      workshopId: ws.id,
      email: `stand-in.${tag}@test.example.com`,
      name: `Stand-in owner ${tag}`,
      role: 'owner',
      passwordHash: 'not a password',
    })
    .returning();
  const [set] = await db.insert(targetSets).values({ workshopId: ws.id, name: 'Stand-in', targets: {} }).returning();
  const [machine] = await db
    .insert(machines)
    .values({
      workshopId: ws.id,
      name: 'Stand-in',
      kind: 'router',
      workAreaXMm: 1,
      workAreaYMm: 1,
      targetSetId: set.id,
    })
    .returning();
  const now = new Date();
  const [approval] = await db
    .insert(approvals)
    .values({
      workshopId: ws.id,
      machineId: machine.id,
      approvedById: owner.id,
      approvedByName: owner.name,
      approvedAt: now,
      statement: 'Stand-in approval for a spec',
      snapshot: {} as never,
      recordHash: '',
      recheckIntervalDays: 1,
      recheckDueAt: now,
      endedAt: now,
    })
    .returning();
  await app.get(RecordsService).lock(approval.id, refs);
  return approval.id;
}
