import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { and, eq, isNull } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../src/database/database.tokens.js';
import { approvalRequests, approvals } from '../src/database/schema/index.js';
import {
  createTestApp,
  createTestWorkshop,
  signIn,
  TEST_PASSWORD,
  type Agent,
  type TestWorkshop,
} from './helpers/test-app.js';
import { board, newMachine, STATEMENT, waiveAllBut } from './support/approval-flow.js';

/**
 * Double clicks and several server instances on one database: the database, not the timing,
 * decides that a machine has one open request and one standing approval.
 */
describe('one request, one signature, under parallel requests and two instances', () => {
  let one: NestFastifyApplication;
  let two: NestFastifyApplication;
  let ws: TestWorkshop;
  let onTwo: Record<'owner' | 'technician', Agent>;

  beforeAll(async () => {
    [one, two] = await Promise.all([createTestApp(), createTestApp()]);
    ws = await createTestWorkshop(one, 'Parallel');
    onTwo = {
      owner: await signIn(two, ws.emails.owner, TEST_PASSWORD),
      technician: await signIn(two, ws.emails.technician, TEST_PASSWORD),
    };
  });
  afterAll(() => Promise.all([one.close(), two.close()]));

  const db = () => one.get<Database>(DRIZZLE);
  const openRequests = async (machineId: string) =>
    (
      await db()
        .select()
        .from(approvalRequests)
        .where(and(eq(approvalRequests.machineId, machineId), eq(approvalRequests.status, 'open')))
    ).length;
  const standing = async (machineId: string) =>
    (
      await db()
        .select()
        .from(approvals)
        .where(and(eq(approvals.machineId, machineId), isNull(approvals.endedAt)))
    ).length;
  const statuses = (results: { status: number }[]) => results.map((r) => r.status).sort();

  async function readyMachine(name: string) {
    const machineId = await newMachine(ws, name);
    await waiveAllBut(ws, machineId, () => false);
    return machineId;
  }

  it('8 simultaneous requests for approval over two instances open exactly one', async () => {
    const machineId = await readyMachine('Parallel request router');
    const send = (i: number) =>
      (i % 2 ? onTwo.technician : ws.as.technician).post(`/api/machines/${machineId}/approval-requests`).send({});
    const results = await Promise.all(Array.from({ length: 8 }, (_, i) => send(i)));
    expect(statuses(results)).toEqual([201, 409, 409, 409, 409, 409, 409, 409]);
    expect(await openRequests(machineId)).toBe(1);
    expect((await board(ws, machineId)).state).toBe('awaiting-approval');
  });

  it('8 simultaneous approvals over two instances store exactly one signature', async () => {
    const machineId = await readyMachine('Parallel approval router');
    expect((await ws.as.technician.post(`/api/machines/${machineId}/approval-requests`).send({})).status).toBe(201);
    const send = (i: number) =>
      (i % 2 ? onTwo.owner : ws.as.owner)
        .post(`/api/machines/${machineId}/approvals`)
        .send({ password: TEST_PASSWORD, statement: STATEMENT });
    const results = await Promise.all(Array.from({ length: 8 }, (_, i) => send(i)));
    expect(statuses(results)).toEqual([201, 409, 409, 409, 409, 409, 409, 409]);
    expect(await standing(machineId)).toBe(1);
    expect(await openRequests(machineId)).toBe(0);
    expect((await board(ws, machineId)).state).toBe('ready-to-cut');
  });

  it('a double reopen ends the approval once; the machine is reopened, not being built', async () => {
    const machineId = await readyMachine('Parallel reopen router');
    expect((await ws.as.technician.post(`/api/machines/${machineId}/approval-requests`).send({})).status).toBe(201);
    expect(
      (
        await ws.as.owner
          .post(`/api/machines/${machineId}/approvals`)
          .send({ password: TEST_PASSWORD, statement: STATEMENT })
      ).status,
    ).toBe(201);
    const send = (i: number) =>
      (i % 2 ? onTwo.owner : ws.as.owner)
        .post(`/api/machines/${machineId}/reopen`)
        .send({ reason: 'Gantry crashed into the end stop' });
    const results = await Promise.all(Array.from({ length: 4 }, (_, i) => send(i)));
    expect(statuses(results)).toEqual([201, 409, 409, 409]);
    expect(await standing(machineId)).toBe(0);
    expect((await board(ws, machineId)).state).toBe('reopened');
  });

  it('the database itself refuses a second open request and a second standing approval', async () => {
    const machineId = await readyMachine('Constraint router');
    const values = {
      workshopId: ws.id,
      machineId,
      requestedById: ws.userIds.technician,
      requestedByName: 'technician',
    };
    await db().insert(approvalRequests).values(values);
    await expect(db().insert(approvalRequests).values(values)).rejects.toMatchObject({
      cause: { code: '23505', constraint: 'approval_requests_one_open' },
    });
  });
});
