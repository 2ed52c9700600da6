import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import pg from 'pg';
import { PG_POOL } from '../src/database/database.tokens.js';
import { LENGTH_UNITS } from '../src/engine/units.js';
import { EVIDENCE_SUBJECT_TYPES, RECORD_TYPE_NAMES, SIGNED_RECORD_TYPES } from '../src/records/kinds.js';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newMachine } from './helpers/drives.js';

/**
 * The database holds the same lists as the code: record kinds (records/kinds.ts), units and
 * states as CHECK constraints, and a partner rail as a foreign key. A write that slips past the
 * services (a script, a hand edit, a future bug) is refused by PostgreSQL itself.
 */
describe('kinds, units and references in the database', () => {
  let app: NestFastifyApplication;
  let pool: pg.Pool;
  let ws: TestWorkshop;
  let machineId: string;

  beforeAll(async () => {
    app = await createTestApp();
    pool = app.get<pg.Pool>(PG_POOL);
    ws = await createTestWorkshop(app, 'Constraints');
    machineId = await newMachine(ws, 'plasma', { x: 3000, y: 1500 });
  });
  afterAll(async () => {
    await app?.close();
  });

  /** The values a `col in (...)` CHECK allows, read back from PostgreSQL's own definition. */
  async function allowed(table: string, constraint: string): Promise<string[]> {
    const { rows } = await pool.query<{ def: string }>(
      'select pg_get_constraintdef(c.oid) as def from pg_constraint c join pg_class t on t.oid = c.conrelid where t.relname = $1 and c.conname = $2',
      [table, constraint],
    );
    expect(rows).toHaveLength(1);
    return [...rows[0].def.matchAll(/'((?:[^']|'')*)'::text/g)].map((m) => m[1].replace(/''/g, "'"));
  }

  /** The error PostgreSQL answers a statement with (null when it was accepted). */
  async function refusal(text: string, values: unknown[]): Promise<{ code: string; constraint: string } | null> {
    try {
      await pool.query(text, values);
      return null;
    } catch (err) {
      const e = err as { code: string; constraint: string };
      return { code: e.code, constraint: e.constraint };
    }
  }

  async function newRail(label: string): Promise<string> {
    const res = await ws.as.builder
      .post(`/api/machines/${machineId}/rails`)
      .send({ label, axis: 'Y1', length: 1000, profileSize: 20, holePitch: 60, firstHole: 20 });
    expect(res.status).toBe(201);
    return res.body.id;
  }

  it('holds the same record kinds as the registry, so neither can drift from the other', async () => {
    expect(await allowed('audit_entries', 'audit_entries_record_type_check')).toEqual(RECORD_TYPE_NAMES);
    expect(await allowed('record_locks', 'record_locks_record_type_check')).toEqual(SIGNED_RECORD_TYPES);
    expect(await allowed('waivers', 'waivers_record_type_check')).toEqual(SIGNED_RECORD_TYPES);
    expect(await allowed('evidence', 'evidence_record_type_check')).toEqual(SIGNED_RECORD_TYPES);
    expect(await allowed('evidence', 'evidence_subject_type_check')).toEqual(EVIDENCE_SUBJECT_TYPES);
  });

  it('holds every unit column of every table to mm, um, in and thou', async () => {
    const { rows } = await pool.query<{ table_name: string; column_name: string }>(
      `select table_name, column_name from information_schema.columns
       where table_schema = 'public' and column_name in ('length_unit', 'reading_unit') order by table_name, column_name`,
    );
    expect(rows.length).toBeGreaterThanOrEqual(18);
    for (const { table_name, column_name } of rows) {
      expect([table_name, await allowed(table_name, `${table_name}_${column_name}_check`)]).toEqual([
        table_name,
        [...LENGTH_UNITS],
      ]);
    }
  });

  it('refuses a misspelt record kind written straight into the history or the locks', async () => {
    expect(
      await refusal(
        "insert into audit_entries (workshop_id, record_type, action, actor_name) values ($1, 'rail_sweep', 'created', 'script')",
        [ws.id],
      ),
    ).toEqual({
      code: '23514',
      constraint: 'audit_entries_record_type_check',
    });
    expect(
      await refusal("insert into record_locks (record_type, record_id, approval_id) values ('sweep', $1, $2)", [
        randomUUID(),
        randomUUID(),
      ]),
    ).toMatchObject({
      code: '23514',
      constraint: 'record_locks_record_type_check',
    });
    // The same statement with a kind of the registry is taken.
    expect(
      await refusal(
        "insert into audit_entries (workshop_id, record_type, action, actor_name) values ($1, 'rail-sweep', 'created', 'script')",
        [ws.id],
      ),
    ).toBeNull();
  });

  it('refuses a unit, face or state outside its list', async () => {
    const railId = await newRail('Y1 (left)');
    expect(await refusal("update rails set length_unit = 'inch' where id = $1", [railId])).toEqual({
      code: '23514',
      constraint: 'rails_length_unit_check',
    });
    expect(await refusal("update machines set length_unit = 'cm' where id = $1", [machineId])).toEqual({
      code: '23514',
      constraint: 'machines_length_unit_check',
    });
    expect(await refusal("update machines set state = 'approved' where id = $1", [machineId])).toEqual({
      code: '23514',
      constraint: 'machines_state_check',
    });
    expect(await refusal("update users set role = 'superuser' where id = $1", [ws.userIds.viewer])).toEqual({
      code: '23514',
      constraint: 'users_role_check',
    });
    expect(await refusal("update rails set length_unit = 'thou' where id = $1", [railId])).toBeNull();
  });

  it('refuses a partner rail id that names no rail, and forgets a partner that is deleted', async () => {
    const left = await newRail('Y1 (left) partnered');
    expect(await refusal('update rails set partner_rail_id = $2 where id = $1', [left, randomUUID()])).toEqual({
      code: '23503',
      constraint: 'rails_partner_rail_id_rails_id_fk',
    });
    const right = await newRail('Y2 (right) partnered');
    expect(await refusal('update rails set partner_rail_id = $2 where id = $1', [left, right])).toBeNull();
    await pool.query('delete from rails where id = $1', [right]);
    const { rows } = await pool.query<{ partner_rail_id: string | null }>(
      'select partner_rail_id from rails where id = $1',
      [left],
    );
    expect(rows[0].partner_rail_id).toBeNull();
  });

  it('refuses a lock that names no approval', async () => {
    expect(
      await refusal("insert into record_locks (record_type, record_id, approval_id) values ('rail-sweep', $1, $2)", [
        randomUUID(),
        randomUUID(),
      ]),
    ).toEqual({
      code: '23503',
      constraint: 'record_locks_approval_id_approvals_id_fk',
    });
  });

  it('refuses a bolt-down hole that names a write never made', async () => {
    const railId = await newRail('Y1 bolted');
    const bd = await ws.as.builder.post(`/api/rails/${railId}/bolt-downs`).send({ mode: 'line', band: 0.01 });
    expect(bd.status).toBe(201);
    const hole = await ws.as.builder
      .put(`/api/bolt-downs/${bd.body.id}/holes/0`)
      .send({ reading: 0, fixed: true, writeId: randomUUID() });
    expect(hole.status).toBe(200);
    const { rows } = await pool.query<{ id: string; last_write_id: string }>(
      'select id, last_write_id from bolt_down_holes where bolt_down_id = $1',
      [bd.body.id],
    );
    expect(rows).toHaveLength(1);
    expect(
      await refusal('update bolt_down_holes set last_write_id = $2 where id = $1', [rows[0].id, randomUUID()]),
    ).toEqual({
      code: '23503',
      constraint: 'bolt_down_holes_last_write_id_bolt_down_writes_write_id_fk',
    });
  });

  it('refuses a history entry for a machine that does not exist', async () => {
    expect(
      await refusal(
        "insert into audit_entries (workshop_id, machine_id, record_type, action, actor_name) values ($1, $2, 'machine', 'created', 'script')",
        [ws.id, randomUUID()],
      ),
    ).toEqual({ code: '23503', constraint: 'audit_entries_machine_id_machines_id_fk' });
  });
});
