import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import pg from 'pg';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, screwAxis } from './helpers/drives.js';
import { PG_POOL } from '../src/database/database.tokens.js';

const rail = { axis: 'Y', length: 1000, profileSize: 20, holePitch: 60, firstHole: 20 };
const positions = [0, 100, 200, 300, 400, 500, 600, 700, 800, 900];
const sweep = (readings: number[], extra: Record<string, unknown> = {}) => ({
  readingUnit: 'mm',
  phase: 'as-left',
  datum: 'Frame face',
  stations: readings.map((reading, i) => ({ position: positions[i], reading })),
  ...extra,
});

/**
 * Reads that do not grow with history: the machines list and the readiness board issue the same
 * number of SQL statements whether a rail has no old sweeps, 100 or 1 000, and read no sweep's
 * readings but the newest per datum and face. The list was 4 statements and the board 22; now
 * 2 (the session with its person, the summaries) and 17.
 */
describe('reads: statements per request do not grow with the number of sweeps', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let pool: pg.Pool;
  let machineId: string;
  let railA: string;
  let railB: string;
  let counting = false;
  let statements: string[] = [];
  const originalQuery = pg.Client.prototype.query;

  beforeAll(async () => {
    app = await createTestApp();
    pool = app.get<pg.Pool>(PG_POOL);
    ws = await createTestWorkshop(app, 'Reads');
    machineId = (
      await ws.as.builder
        .post('/api/machines')
        .send({ name: 'Growth table', kind: 'plasma', workArea: { x: 900, y: 600 } })
    ).body.id;
    // A second machine, so the list has more than one summary to read.
    await ws.as.builder
      .post('/api/machines')
      .send({ name: 'Quiet router', kind: 'router', workArea: { x: 600, y: 400 } });
    railA = (await ws.as.builder.post(`/api/machines/${machineId}/rails`).send({ ...rail, label: 'Y1 (left)' })).body
      .id;
    railB = (
      await ws.as.builder
        .post(`/api/machines/${machineId}/rails`)
        .send({ ...rail, label: 'Y2 (right)', partnerRailId: railA })
    ).body.id;
    expect(
      (
        await ws.as.builder
          .post(`/api/rails/${railA}/sweeps`)
          .send(sweep([0, 0.002, 0.004, 0.003, 0.001, 0, 0.002, 0.003, 0.001, 0]))
      ).status,
    ).toBe(201);
    expect(
      (
        await ws.as.builder
          .post(`/api/rails/${railB}/sweeps`)
          .send(sweep([0.01, 0.012, 0.013, 0.012, 0.011, 0.01, 0.012, 0.013, 0.011, 0.01]))
      ).status,
    ).toBe(201);
    await newAxis(ws, machineId, screwAxis('X'));
    // Every statement any pg client sends while counting is on (pool queries and transactions alike).
    pg.Client.prototype.query = function (this: pg.Client, ...args: unknown[]) {
      if (counting)
        statements.push(typeof args[0] === 'string' ? args[0] : String((args[0] as { text?: string })?.text ?? ''));
      return (originalQuery as (...a: unknown[]) => unknown).apply(this, args);
    } as typeof pg.Client.prototype.query;
  });

  afterAll(async () => {
    pg.Client.prototype.query = originalQuery;
    await app.close();
  });

  /** Older sweeps than the ones recorded through the API, written straight to the table for speed. */
  async function addOldSweeps(railId: string, n: number) {
    await pool.query(
      `insert into rail_sweeps (workshop_id, machine_id, rail_id, reading_unit, length_unit, face, positions_mm, readings_raw, readings_mm, phase, taken_by, datum, result, status, target, taken_at)
       select s.workshop_id, s.machine_id, s.rail_id, s.reading_unit, s.length_unit, s.face, s.positions_mm, s.readings_raw, s.readings_mm, 'as-found', 'History', s.datum, s.result, s.status, s.target,
              s.taken_at - make_interval(mins => g)
       from rail_sweeps s cross join generate_series(1, $2::int) g
       where s.id = (select id from rail_sweeps where rail_id = $1 order by taken_at desc limit 1)`,
      [railId, n],
    );
  }

  async function count(path: string) {
    statements = [];
    counting = true;
    const res = await ws.as.viewer.get(path);
    counting = false;
    expect(res.status).toBe(200);
    // The session is read with its person in one statement when it is not kept from a request a
    // few seconds before (session-cache.ts); counted apart so the numbers do not hang on timing.
    const session = statements.filter((s) => /from "session"/.test(s));
    expect(session.length).toBeLessThanOrEqual(1);
    return { n: statements.length - session.length, body: res.body, statements: [...statements] };
  }

  it('lists machines and shows the board in a fixed number of statements at 0, 100 and 1 000 old sweeps', async () => {
    const seen: Record<number, { list: number; board: number; rails: number }> = {};
    let firstBoard: unknown = null;
    let firstList: unknown = null;
    for (const total of [0, 100, 1000]) {
      const have =
        Number((await pool.query('select count(*) from rail_sweeps where rail_id = $1', [railA])).rows[0].count) - 1;
      if (total > have) {
        await addOldSweeps(railA, total - have);
        await addOldSweeps(railB, total - have);
      }
      const list = await count('/api/machines');
      const board = await count(`/api/machines/${machineId}/readiness`);
      const rails = await count(`/api/machines/${machineId}/rails`);
      seen[total] = { list: list.n, board: board.n, rails: rails.n };
      // The rails tab counts the sweeps and shows the newest: it never reads their readings.
      expect((rails.body as { sweepCount: number }[]).map((r) => r.sweepCount)).toEqual([total + 1, total + 1]);
      expect(rails.statements.some((s) => /readings_mm|readings_raw/.test(s))).toBe(false);
      // Old sweeps change nothing the reads show: the newest sweep of each rail still decides.
      const mine = (list.body as { id: string }[]).find((m) => m.id === machineId);
      firstList ??= mine;
      firstBoard ??= board.body.checks;
      expect(mine).toEqual(firstList);
      expect(board.body.checks).toEqual(firstBoard);
      // The list reads the summaries only: no record table, no re-check query when nothing is due.
      expect(list.statements.some((s) => /rail_sweeps/.test(s))).toBe(false);
      expect(list.statements.filter((s) => /machine_readiness/.test(s))).toHaveLength(1);
      expect(list.statements.some((s) => /"checks"/.test(s))).toBe(false);
      // The board reads a sweep's readings only for the newest sweep per rail, datum and face.
      const readingArrays = board.statements.filter((s) => /readings_mm|readings_raw|positions_mm\b(?!\))/.test(s));
      expect(readingArrays.every((s) => /lower\(x\.datum\) = k\.dkey/.test(s))).toBe(true);
      // Nothing is due, so neither read runs the re-check schedule's query.
      expect(
        [...list.statements, ...board.statements].some((s) => /distinct on \("approvals"\."machine_id"\)/.test(s)),
      ).toBe(false);
      // The machine's axes are read once, though two contributors (drives and backlash) need them.
      expect(board.statements.filter((s) => /from "axes"/.test(s))).toHaveLength(1);
      // The machine, its target set and its waivers come in one statement.
      const context = board.statements.filter((s) => /"target_sets"|"waivers"/.test(s));
      expect(context).toHaveLength(1);
      expect(context[0]).toMatch(
        /from "machines" m[\s\S]*"target_sets"[\s\S]*"waivers"|"waivers"[\s\S]*from "machines" m[\s\S]*"target_sets"/,
      );
    }
    // Measured on this code: printed so a change in the numbers is seen in the test output.
    console.log(`SQL statements per request by old sweeps per rail: ${JSON.stringify(seen)}`);
    expect(seen[100]).toEqual(seen[0]);
    expect(seen[1000]).toEqual(seen[0]);
    // The list reads the summaries, not the records: a handful of statements, not one per check.
    expect(seen[0].list).toBe(1);
    expect(seen[0].board).toBeLessThanOrEqual(13);
  });
});
