import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import pg from 'pg';
import { PG_POOL } from '../src/database/database.tokens.js';
import { createTestApp, createTestWorkshop, TEST_PASSWORD, type Agent, type TestWorkshop } from './helpers/test-app.js';
import { newMachine, screwAxis } from './helpers/drives.js';
import { STATEMENT, waiveAllBut } from './support/approval-flow.js';
import { makePng } from './evidence-fixtures.js';

/**
 * The audit trail: every write route leaves, in its own transaction, a summary a person reads and
 * the database's log of every value it changed (before and after); a failed command leaves
 * neither; the history cannot be rewritten; it is paged and filtered, never capped.
 */
describe('audit trail', () => {
  let app: NestFastifyApplication;
  let pool: pg.Pool;
  let ws: TestWorkshop;
  const seen = new Set<string>();

  /** Summaries written since the last call, with the change-log rows of their transactions. */
  async function newEntries() {
    const { rows } = await pool.query<{
      id: string;
      txid: string;
      summary: string;
      record_type: string;
      action: string;
    }>('select id, txid::text, summary, record_type, action from audit_entries where workshop_id = $1 order by at', [
      ws.id,
    ]);
    const fresh = rows.filter((r) => !seen.has(r.id));
    fresh.forEach((r) => seen.add(r.id));
    const txids = [...new Set(fresh.map((r) => r.txid))];
    const changes = txids.length
      ? (
          await pool.query<{
            txid: string;
            table_name: string;
            operation: string;
            old_values: unknown;
            new_values: unknown;
          }>(
            'select txid::text, table_name, operation, old_values, new_values from change_log where txid = any($1::bigint[])',
            [txids],
          )
        ).rows
      : [];
    return { entries: fresh, changes };
  }

  beforeAll(async () => {
    app = await createTestApp();
    pool = app.get<pg.Pool>(PG_POOL);
    ws = await createTestWorkshop(app, 'Audit');
    await newEntries(); // the sign-ins of the test members
  });
  afterAll(() => app.close());

  const ids: Record<string, string> = {};
  const stations = [0, 100, 200, 300, 400, 500, 600, 700].map((position, i) => ({
    position,
    reading: (i % 3) * 0.002,
  }));
  type Step = [
    name: string,
    role: keyof TestWorkshop['as'],
    send: (a: Agent) => Promise<{ status: number; body: Record<string, unknown> }>,
    expected: { table: string; operation: 'insert' | 'update' | 'delete' },
    keep?: string,
  ];

  // Every write route of the product, in an order where each finds what it needs.
  const steps: Step[] = [
    [
      'POST /api/machines',
      'owner',
      (a) =>
        a
          .post('/api/machines')
          .send({ name: `Audit router ${randomUUID().slice(0, 6)}`, kind: 'router', workArea: { x: 900, y: 600 } }),
      { table: 'machines', operation: 'insert' },
      'machine',
    ],
    [
      'PATCH /api/machines/:id',
      'owner',
      (a) => a.patch(`/api/machines/${ids.machine}`).send({ notes: 'gantry on the north wall' }),
      { table: 'machines', operation: 'update' },
    ],
    [
      'POST /api/machines/:id/rails',
      'builder',
      (a) =>
        a
          .post(`/api/machines/${ids.machine}/rails`)
          .send({ label: 'Y1 (left)', axis: 'Y1', length: 800, holePitch: 60, firstHole: 40 }),
      { table: 'rails', operation: 'insert' },
      'rail',
    ],
    [
      'PATCH /api/rails/:id',
      'builder',
      (a) => a.patch(`/api/rails/${ids.rail}`).send({ holePitch: 120 }),
      { table: 'rails', operation: 'update' },
    ],
    [
      'POST /api/rails/:id/sweeps',
      'builder',
      (a) => a.post(`/api/rails/${ids.rail}/sweeps`).send({ readingUnit: 'mm', phase: 'as-left', stations }),
      { table: 'rail_sweeps', operation: 'insert' },
      'sweep',
    ],
    [
      'DELETE /api/sweeps/:id',
      'builder',
      (a) => a.delete(`/api/sweeps/${ids.sweep}`),
      { table: 'rail_sweeps', operation: 'delete' },
    ],
    [
      'POST /api/rails/:id/bolt-downs',
      'builder',
      (a) => a.post(`/api/rails/${ids.rail}/bolt-downs`).send({ mode: 'line', readingUnit: 'um' }),
      { table: 'bolt_downs', operation: 'insert' },
      'boltDown',
    ],
    [
      'PUT /api/bolt-downs/:id/holes/:index',
      'builder',
      (a) => a.put(`/api/bolt-downs/${ids.boltDown}/holes/1`).send({ reading: 2, fixed: false, writeId: randomUUID() }),
      { table: 'bolt_down_holes', operation: 'insert' },
    ],
    [
      'POST /api/bolt-downs/:id/final-sweep',
      'builder',
      async (a) => {
        // The final sweep is taken once every hole is fixed.
        const bd = await a.get(`/api/bolt-downs/${ids.boltDown}`);
        for (let i = 0; i < bd.body.holes.length; i++)
          await a
            .put(`/api/bolt-downs/${ids.boltDown}/holes/${i}`)
            .send({ reading: 1, fixed: true, writeId: randomUUID() });
        const atHoles = (bd.body.holes as { position: number }[]).map((h) => ({ position: h.position, reading: 1 }));
        return a
          .post(`/api/bolt-downs/${ids.boltDown}/final-sweep`)
          .send({ readingUnit: 'um', phase: 'as-left', stations: atHoles });
      },
      { table: 'rail_sweeps', operation: 'insert' },
    ],
    [
      'POST /api/machines/:id/axes',
      'technician',
      (a) => a.post(`/api/machines/${ids.machine}/axes`).send(screwAxis('X')),
      { table: 'axes', operation: 'insert' },
      'axis',
    ],
    [
      'PATCH /api/axes/:id',
      'technician',
      (a) => a.patch(`/api/axes/${ids.axis}`).send({ maxFeedRate: 4000 }),
      { table: 'axes', operation: 'update' },
    ],
    [
      'POST /api/axes/:id/travel-trials',
      'technician',
      (a) =>
        a
          .post(`/api/axes/${ids.axis}/travel-trials`)
          .send({ lengthUnit: 'mm', moves: [{ commanded: 100, measured: 99.8 }] }),
      { table: 'travel_trials', operation: 'insert' },
      'trial',
    ],
    [
      'POST /api/axes/:id/travel-trials/:trialId/apply',
      'technician',
      (a) => a.post(`/api/axes/${ids.axis}/travel-trials/${ids.trial}/apply`),
      { table: 'axes', operation: 'update' },
    ],
    [
      'POST /api/axes/:id/travel-trials (a second)',
      'technician',
      (a) =>
        a
          .post(`/api/axes/${ids.axis}/travel-trials`)
          .send({ lengthUnit: 'mm', moves: [{ commanded: 100, measured: 100.1 }] }),
      { table: 'travel_trials', operation: 'insert' },
      'trial2',
    ],
    [
      'DELETE /api/axes/:id/travel-trials/:trialId',
      'technician',
      (a) => a.delete(`/api/axes/${ids.axis}/travel-trials/${ids.trial2}`),
      { table: 'travel_trials', operation: 'delete' },
    ],
    [
      'POST /api/axes/:id/positioning-runs',
      'technician',
      (a) =>
        a.post(`/api/axes/${ids.axis}/positioning-runs`).send({
          readingUnit: 'um',
          targets: [10, 20],
          runs: [
            { direction: 'up', deviations: [1, 2] },
            { direction: 'up', deviations: [2, 2] },
            { direction: 'down', deviations: [0, 1] },
            { direction: 'down', deviations: [-1, 0] },
          ],
        }),
      { table: 'positioning_runs', operation: 'insert' },
      'run',
    ],
    [
      'DELETE /api/axes/:id/positioning-runs/:runId',
      'technician',
      (a) => a.delete(`/api/axes/${ids.axis}/positioning-runs/${ids.run}`),
      { table: 'positioning_runs', operation: 'delete' },
    ],
    [
      'POST /api/machines/:id/diagonal-checks',
      'technician',
      (a) =>
        a
          .post(`/api/machines/${ids.machine}/diagonal-checks`)
          .send({ lengthUnit: 'mm', sideX: 1000, sideY: 600, diagonal1: 1166.2, diagonal2: 1166.0 }),
      { table: 'diagonal_checks', operation: 'insert' },
      'diagonal',
    ],
    [
      'DELETE /api/machines/:id/diagonal-checks/:recordId',
      'technician',
      (a) => a.delete(`/api/machines/${ids.machine}/diagonal-checks/${ids.diagonal}`),
      { table: 'diagonal_checks', operation: 'delete' },
    ],
    [
      'POST /api/machines/:id/bed-grids',
      'technician',
      (a) =>
        a.post(`/api/machines/${ids.machine}/bed-grids`).send({
          lengthUnit: 'mm',
          readingUnit: 'mm',
          columns: 2,
          rows: 2,
          points: [
            { x: 0, y: 0, z: 0 },
            { x: 100, y: 0, z: 0.01 },
            { x: 0, y: 100, z: 0 },
            { x: 100, y: 100, z: 0.02 },
          ],
        }),
      { table: 'bed_grids', operation: 'insert' },
      'grid',
    ],
    [
      'DELETE /api/machines/:id/bed-grids/:recordId',
      'technician',
      (a) => a.delete(`/api/machines/${ids.machine}/bed-grids/${ids.grid}`),
      { table: 'bed_grids', operation: 'delete' },
    ],
    [
      'POST /api/machines/:id/test-cuts',
      'technician',
      (a) =>
        a.post(`/api/machines/${ids.machine}/test-cuts`).send({
          lengthUnit: 'mm',
          nominal: { x: 300, y: 300, circle: 100 },
          measured: { x: 299.9, y: 300.1, diagonal1: 424.2, diagonal2: 424.3, circleX: 100, circleY: 100.1 },
          stepsPerMm: { x: 80, y: 80 },
        }),
      { table: 'test_cuts', operation: 'insert' },
      'cut',
    ],
    [
      'DELETE /api/machines/:id/test-cuts/:recordId',
      'technician',
      (a) => a.delete(`/api/machines/${ids.machine}/test-cuts/${ids.cut}`),
      { table: 'test_cuts', operation: 'delete' },
    ],
    [
      'POST /api/safety-items',
      'owner',
      (a) => a.post('/api/safety-items').send({ section: 'cutting', text: 'Slag bin emptied' }),
      { table: 'safety_items', operation: 'insert' },
      'safetyItem',
    ],
    [
      'PUT /api/machines/:id/safety-walk/items/:itemId',
      'technician',
      (a) => a.put(`/api/machines/${ids.machine}/safety-walk/items/${ids.safetyItem}`).send({ answer: 'yes' }),
      { table: 'safety_answers', operation: 'insert' },
    ],
    [
      'POST /api/machines/:id/safety-walk/rounds',
      'owner',
      (a) => a.post(`/api/machines/${ids.machine}/safety-walk/rounds`),
      { table: 'safety_walks', operation: 'insert' },
    ],
    [
      'DELETE /api/rails/:id',
      'builder',
      (a) =>
        a
          .post(`/api/machines/${ids.machine}/rails`)
          .send({ label: 'X1', axis: 'X', length: 600, holePitch: 60, firstHole: 30 })
          .then((r) => a.delete(`/api/rails/${r.body.id}`)),
      { table: 'rails', operation: 'delete' },
    ],
    [
      'DELETE /api/axes/:id',
      'technician',
      (a) =>
        a
          .post(`/api/machines/${ids.machine}/axes`)
          .send(screwAxis('Z'))
          .then((r) => a.delete(`/api/axes/${r.body.id}`)),
      { table: 'axes', operation: 'delete' },
    ],
    [
      'POST /api/target-sets',
      'owner',
      (a) =>
        a.get('/api/target-sets').then((l) =>
          a.post('/api/target-sets').send({
            name: `Audit set ${randomUUID().slice(0, 6)}`,
            description: 'for the audit test',
            targets: l.body[0].targets,
          }),
        ),
      { table: 'target_sets', operation: 'insert' },
      'targetSet',
    ],
    [
      'PATCH /api/target-sets/:id',
      'owner',
      (a) => a.patch(`/api/target-sets/${ids.targetSet}`).send({ description: 'Edited for the audit test' }),
      { table: 'target_sets', operation: 'update' },
    ],
    [
      'POST /api/people',
      'admin',
      (a) =>
        a
          .post('/api/people')
          .send({ name: 'Audit Person', email: `audit.${randomUUID().slice(0, 8)}@test.example.com`, role: 'viewer' }),
      { table: 'users', operation: 'insert' },
      'person',
    ],
    [
      'PATCH /api/people/:id',
      'admin',
      (a) => a.patch(`/api/people/${ids.person}`).send({ role: 'builder' }),
      { table: 'users', operation: 'update' },
    ],
    [
      'POST /api/people/:id/password-reset',
      'admin',
      (a) => a.post(`/api/people/${ids.person}/password-reset`),
      { table: 'users', operation: 'update' },
    ],
  ];

  it.each(steps.map((s, i) => [s[0], i] as const))(
    '%s leaves a summary and its values before and after, in one transaction',
    async (_name, i) => {
      const [name, role, send, expected, keep] = steps[i];
      const res = await send(ws.as[role]);
      if (res.status >= 300) throw new Error(`${name}: ${res.status} ${JSON.stringify(res.body)}`);
      if (keep) ids[keep] = (res.body.id ?? (res.body as { person?: { id: string } }).person?.id) as string;
      const { entries, changes } = await newEntries();
      expect(entries.length).toBeGreaterThan(0);
      for (const e of entries) expect(e.summary.length).toBeGreaterThan(5);
      const row = changes.find((c) => c.table_name === expected.table && c.operation === expected.operation);
      expect({ name, found: !!row }).toEqual({ name, found: true });
      // The row's transaction is the summary's transaction.
      expect(entries.map((e) => e.txid)).toContain(changes.find((c) => c === row)!.txid);
      if (expected.operation !== 'insert') expect(row!.old_values).toEqual(expect.any(Object));
      if (expected.operation !== 'delete') expect(row!.new_values).toEqual(expect.any(Object));
      if (expected.operation === 'delete') expect(row!.new_values).toBeNull();
    },
  );

  it('waivers, approval requests, approvals and reopenings are audited with their values', async () => {
    const machineId = await newMachine(ws, 'router');
    await newEntries();
    await waiveAllBut(ws, machineId, () => false);
    let got = await newEntries();
    expect(got.entries.some((e) => e.record_type === 'waiver' && e.action === 'created')).toBe(true);
    expect(got.changes.some((c) => c.table_name === 'waivers' && c.operation === 'insert')).toBe(true);
    expect((await ws.as.technician.post(`/api/machines/${machineId}/approval-requests`).send({})).status).toBe(201);
    got = await newEntries();
    expect(got.changes.some((c) => c.table_name === 'approval_requests' && c.operation === 'insert')).toBe(true);
    expect(got.changes.some((c) => c.table_name === 'machines' && c.operation === 'update')).toBe(true);
    expect(
      (
        await ws.as.owner
          .post(`/api/machines/${machineId}/approvals`)
          .send({ password: TEST_PASSWORD, statement: STATEMENT })
      ).status,
    ).toBe(201);
    got = await newEntries();
    expect(got.entries.some((e) => e.record_type === 'approval' && e.action === 'approved')).toBe(true);
    expect(got.changes.some((c) => c.table_name === 'approvals' && c.operation === 'insert')).toBe(true);
    expect(
      (await ws.as.owner.post(`/api/machines/${machineId}/reopen`).send({ reason: 'Rail knocked by a trolley' }))
        .status,
    ).toBe(201);
    got = await newEntries();
    expect(got.entries.some((e) => e.action === 'reopened')).toBe(true);
    expect(got.changes.some((c) => c.table_name === 'approvals' && c.operation === 'update')).toBe(true);
  });

  it('evidence: an upload and its removal are audited with their values', async () => {
    const machineId = await newMachine(ws, 'router');
    await newEntries();
    const up = await ws.as.builder
      .post('/api/evidence')
      .field('subjectType', 'machine')
      .field('subjectId', machineId)
      .attach('file', await makePng(20, 20), 'gantry.png');
    expect(up.status).toBe(201);
    let got = await newEntries();
    expect(got.entries.some((e) => e.record_type === 'evidence')).toBe(true);
    expect(got.changes.some((c) => c.table_name === 'evidence' && c.operation === 'insert')).toBe(true);
    expect((await ws.as.builder.delete(`/api/evidence/${up.body.id}`)).status).toBe(204);
    got = await newEntries();
    expect(
      got.changes.some((c) => c.table_name === 'evidence' && c.operation === 'delete' && c.old_values !== null),
    ).toBe(true);
  });

  it('a command that fails leaves neither the record nor its audit entries', async () => {
    const machineId = await newMachine(ws, 'router');
    await newEntries();
    const before = (await pool.query('select count(*)::int n from change_log where workshop_id = $1', [ws.id])).rows[0]
      .n;
    // The approval's password is wrong: 403, and nothing of the command stays.
    const bad = await ws.as.owner
      .post(`/api/machines/${machineId}/approvals`)
      .send({ password: 'not the password', statement: STATEMENT });
    expect(bad.status).toBeGreaterThanOrEqual(400);
    const dup = await ws.as.owner
      .post('/api/machines')
      .send({ name: 'x', kind: 'router', workArea: { x: -5, y: 600 } });
    expect(dup.status).toBe(400);
    expect((await newEntries()).entries).toEqual([]);
    expect((await pool.query('select count(*)::int n from change_log where workshop_id = $1', [ws.id])).rows[0].n).toBe(
      before,
    );
  });

  it('the history cannot be changed or deleted, not even by the database role of the application', async () => {
    await expect(pool.query('delete from audit_entries where workshop_id = $1', [ws.id])).rejects.toThrow(
      /append-only|permission denied/,
    );
    await expect(
      pool.query("update audit_entries set summary = 'rewritten' where workshop_id = $1", [ws.id]),
    ).rejects.toThrow(/append-only|permission/);
    await expect(pool.query('delete from change_log where workshop_id = $1', [ws.id])).rejects.toThrow(
      /append-only|permission/,
    );
    await expect(pool.query('truncate audit_entries')).rejects.toThrow(/append-only|permission|owner/);
    // The table owner (who runs migrations) is refused too: by the triggers, not by grants.
    const owner = new pg.Client({ connectionString: process.env.DATABASE_OWNER_URL ?? process.env.DATABASE_URL });
    await owner.connect();
    try {
      await expect(owner.query('delete from audit_entries where workshop_id = $1', [ws.id])).rejects.toThrow(
        /audit_entries is append-only/,
      );
      await expect(
        owner.query("update change_log set actor_name = 'someone else' where workshop_id = $1", [ws.id]),
      ).rejects.toThrow(/change_log is append-only/);
      await expect(owner.query('truncate change_log')).rejects.toThrow(/change_log is append-only/);
    } finally {
      await owner.end();
    }
  });

  describe('reading it', () => {
    it('a machine history is paged by cursor, never capped, newest first, with no entry twice', async () => {
      const machineId = await newMachine(ws, 'router');
      for (let i = 0; i < 7; i++)
        expect((await ws.as.owner.patch(`/api/machines/${machineId}`).send({ notes: `note ${i}` })).status).toBe(200);
      const seenIds: string[] = [];
      let cursor: string | null = null;
      let pages = 0;
      do {
        const res = await ws.as.viewer
          .get(`/api/machines/${machineId}/history`)
          .query({ limit: 3, ...(cursor ? { cursor } : {}) });
        expect(res.status).toBe(200);
        expect(res.body.entries.length).toBeLessThanOrEqual(3);
        seenIds.push(...res.body.entries.map((e: { id: string }) => e.id));
        cursor = res.body.nextCursor;
        pages++;
      } while (cursor);
      expect(seenIds).toHaveLength(8); // created + 7 changes
      expect(new Set(seenIds).size).toBe(8);
      expect(pages).toBe(3);
      const all = (await ws.as.viewer.get(`/api/machines/${machineId}/history`)).body.entries;
      expect(all.map((e: { id: string }) => e.id)).toEqual(seenIds);
      expect(all[0]).toMatchObject({
        action: 'updated',
        kind: 'Machine',
        at: expect.stringMatching(/Z$/),
        fieldChanges: [{ record: 'Machine', field: 'notes', before: 'note 5', after: 'note 6' }],
      });
    });

    it('values shown carry no internal ids or hashes', async () => {
      const res = await ws.as.admin.get('/api/history').query({ limit: 200 });
      expect(res.status).toBe(200);
      const fields = res.body.entries.flatMap((e: { fieldChanges: { field: string }[] }) =>
        e.fieldChanges.map((c) => c.field),
      );
      expect(fields.length).toBeGreaterThan(0);
      for (const f of fields) expect(f).not.toMatch(/(^id$| id$|hash|token)/);
      expect(JSON.stringify(res.body)).not.toMatch(/scrypt\$/);
    });

    it('filters by kind, person and dates; bad filters are 400 naming the field', async () => {
      const machineId = await newMachine(ws, 'router');
      await ws.as.technician.patch(`/api/machines/${machineId}`).send({ notes: 'by the technician' });
      const byPerson = await ws.as.viewer.get(`/api/machines/${machineId}/history`).query({ person: 'technician' });
      expect(byPerson.body.entries).toHaveLength(1);
      expect(byPerson.body.entries[0].actor).toMatch(/technician/);
      const byKind = await ws.as.admin.get('/api/history').query({ kind: 'person', limit: 200 });
      expect(byKind.body.entries.length).toBeGreaterThan(0);
      expect(byKind.body.entries.every((e: { recordType: string }) => e.recordType === 'person')).toBe(true);
      const tomorrow = new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);
      expect(
        (await ws.as.viewer.get(`/api/machines/${machineId}/history`).query({ from: tomorrow })).body.entries,
      ).toEqual([]);
      expect(
        (await ws.as.viewer.get(`/api/machines/${machineId}/history`).query({ to: '2000-01-01' })).body.entries,
      ).toEqual([]);
      const today = new Date().toISOString().slice(0, 10);
      expect(
        (await ws.as.viewer.get(`/api/machines/${machineId}/history`).query({ from: today, to: today })).body.entries,
      ).toHaveLength(2);
      for (const [q, field] of [
        [{ from: 'yesterday' }, 'from'],
        [{ limit: 0 }, 'limit'],
        [{ limit: 1000 }, 'limit'],
        [{ cursor: 'bm90IGEgY3Vyc29y' }, 'cursor'],
        [{ kind: 'DROP TABLE' }, 'kind'],
      ] as const) {
        const res = await ws.as.viewer.get(`/api/machines/${machineId}/history`).query(q);
        expect({ q, status: res.status }).toEqual({ q, status: 400 });
        expect(JSON.stringify(res.body.message)).toContain(field);
      }
    });

    it('the workshop history is for admins and owners, and shows target sets, people and every machine', async () => {
      for (const role of ['technician', 'builder', 'viewer'] as const)
        expect((await ws.as[role].get('/api/history')).status).toBe(403);
      const res = await ws.as.owner.get('/api/history').query({ limit: 200 });
      expect(res.status).toBe(200);
      const kinds = new Set(res.body.entries.map((e: { recordType: string }) => e.recordType));
      for (const k of ['target-set', 'person', 'machine', 'sign-in']) expect(kinds.has(k)).toBe(true);
      const targetSet = res.body.entries.find(
        (e: { recordType: string; action: string }) => e.recordType === 'target-set' && e.action === 'updated',
      );
      expect(targetSet.fieldChanges).toEqual(
        expect.arrayContaining([
          expect.objectContaining({ record: 'Target set', field: 'description', after: 'Edited for the audit test' }),
        ]),
      );
      const other = await createTestWorkshop(app, 'Elsewhere');
      const theirs = await other.as.admin.get('/api/history').query({ limit: 200 });
      expect(theirs.body.entries.some((e: { summary: string }) => e.summary.includes('Audit'))).toBe(false);
    });
  });
});
