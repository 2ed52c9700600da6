import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import type { CheckRecords } from '../src/records/check-records.js';
import type { backlashChecks } from '../src/database/schema/index.js';
import { BACKLASH_TABLE } from '../src/drives/backlash.service.js';
import { DIAGONAL_CHECK_TABLE } from '../src/frame/diagonal-checks.service.js';
import { CheckRecordsRepository } from '../src/records/check-records.repository.js';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, newMachine, screwAxis } from './helpers/drives.js';

// Ids that differ only in their last group, in a known order: PostgreSQL compares uuid values
// byte by byte, most significant first (PostgreSQL source, uuid_cmp: memcmp of the 16 bytes),
// so these sort as their numbers do. The first groups are new on every run.
const prefix = randomUUID().slice(0, 24);
const idOf = (n: number) => `${prefix}${n.toString(16).padStart(12, '0')}`;

/**
 * The shared repository of check records, on the backlash table: pages newest first with ties
 * broken by id, cursors held to their own parent and workshop, and the newest record per parent.
 */
describe('check records: the shared repository', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let machineId: string;
  let xId: string;
  let yId: string;
  let emptyAxisId: string;
  let otherAxisId: string;
  let records: CheckRecords<typeof backlashChecks>;
  // Five records of X: two share the oldest time, two share the newest (ids 3 < 4, 5 < 6).
  const base = Date.parse('2026-03-02T08:00:00Z');
  const xRows: { id: string; at: Date }[] = [
    { id: idOf(3), at: new Date(base) },
    { id: idOf(4), at: new Date(base) },
    { id: idOf(1), at: new Date(base + 60_000) },
    { id: idOf(5), at: new Date(base + 120_000) },
    { id: idOf(6), at: new Date(base + 120_000) },
  ];
  // Y's two records share a time; the larger id is the newer.
  const yRows = [
    { id: idOf(8), at: new Date(base + 30_000) },
    { id: idOf(7), at: new Date(base + 30_000) },
  ];
  // Newest first: time descending, then id descending.
  const xNewestFirst = [idOf(6), idOf(5), idOf(1), idOf(4), idOf(3)];

  const values = (workshopId: string, machine: string, axisId: string, id: string, createdAt: Date) => ({
    id,
    workshopId,
    machineId: machine,
    axisId,
    lengthUnit: 'mm' as const,
    readingUnit: 'um' as const,
    positions: [{ position: 10, up: [1, 2], down: [3, 4] }],
    resolution: 0.5,
    result: { backlashMm: 0.002, id },
    recordedByName: 'Paging test',
    createdAt,
    updatedAt: createdAt,
  });

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Check records');
    other = await createTestWorkshop(app, 'Check records other');
    machineId = await newMachine(ws, 'router');
    xId = await newAxis(ws, machineId, screwAxis('X'));
    yId = await newAxis(ws, machineId, screwAxis('Y'));
    emptyAxisId = await newAxis(ws, machineId, screwAxis('Z'));
    const otherMachineId = await newMachine(other, 'router');
    otherAxisId = await newAxis(other, otherMachineId, screwAxis('X'));
    records = app.get(CheckRecordsRepository).of(BACKLASH_TABLE);
    for (const r of xRows) await records.insert(values(ws.id, machineId, xId, r.id, r.at));
    for (const r of yRows) await records.insert(values(ws.id, machineId, yId, r.id, r.at));
    await records.insert(values(other.id, otherMachineId, otherAxisId, idOf(9), new Date(base + 600_000)));
  });
  afterAll(() => app.close());

  it('gives limit + 1 rows newest first, equal times in descending id', async () => {
    const rows = await records.page(ws.id, xId, null, 2);
    expect(rows.map((r) => r.id)).toEqual(xNewestFirst.slice(0, 3));
    expect((await records.page(ws.id, xId, null, 50)).map((r) => r.id)).toEqual(xNewestFirst);
  });

  it('walks every page from the last id of the one before, each record once', async () => {
    const seen: string[] = [];
    let cursor: string | null = null;
    for (let pages = 0; pages < 10; pages++) {
      const rows = await records.page(ws.id, xId, cursor, 2);
      const page = rows.slice(0, 2);
      seen.push(...page.map((r) => r.id));
      if (rows.length <= 2) break;
      cursor = page[page.length - 1].id;
    }
    expect(seen).toEqual(xNewestFirst);
    // A cursor inside a tie continues with the rest of the tie.
    expect((await records.page(ws.id, xId, idOf(4), 50)).map((r) => r.id)).toEqual([idOf(3)]);
    expect((await records.page(ws.id, xId, idOf(6), 50)).map((r) => r.id)).toEqual(xNewestFirst.slice(1));
  });

  it('gives an empty page for a cursor of another parent, another workshop or no record', async () => {
    expect(await records.page(ws.id, xId, yRows[0].id, 50)).toEqual([]);
    expect(await records.page(ws.id, xId, idOf(9), 50)).toEqual([]);
    expect(await records.page(ws.id, xId, randomUUID(), 50)).toEqual([]);
    expect(await records.page(other.id, xId, null, 50)).toEqual([]);
  });

  it('gives the newest few of a parent as a whole list', async () => {
    expect((await records.newest(ws.id, xId, 3)).map((r) => r.id)).toEqual(xNewestFirst.slice(0, 3));
    expect((await records.newest(ws.id, xId, 1)).map((r) => r.id)).toEqual([idOf(6)]);
    expect(await records.newest(ws.id, emptyAxisId, 5)).toEqual([]);
  });

  it('orders a table that keeps its own time (recorded_at) by that time, under a machine', async () => {
    const diagonals = app.get(CheckRecordsRepository).of(DIAGONAL_CHECK_TABLE);
    const diagonal = (id: string, recordedAt: Date) =>
      diagonals.insert({
        id,
        workshopId: ws.id,
        machineId,
        sideXMm: 800,
        sideYMm: 500,
        diagonal1Mm: 943.4,
        diagonal2Mm: 943.6,
        recordedByName: 'Paging test',
        recordedAt,
      });
    // Inserted newest first, so the order of insertion cannot pass for the order of time.
    await diagonal(idOf(21), new Date(base + 60_000));
    await diagonal(idOf(20), new Date(base));
    await diagonal(idOf(22), new Date(base));
    expect((await diagonals.newest(ws.id, machineId, 10)).map((r) => r.id)).toEqual([idOf(21), idOf(22), idOf(20)]);
    expect((await diagonals.page(ws.id, machineId, idOf(22), 10)).map((r) => r.id)).toEqual([idOf(20)]);
    const latest = (await diagonals.latest(ws.id, [machineId])).get(machineId);
    expect(latest).toEqual(await diagonals.byId(ws.id, idOf(21)));
    expect(latest?.recordedAt.toISOString()).toBe(new Date(base + 60_000).toISOString());
  });

  it('finds a record only under its own parent, and by id only in its own workshop', async () => {
    expect((await records.find(ws.id, xId, idOf(5)))?.id).toBe(idOf(5));
    expect(await records.find(ws.id, yId, idOf(5))).toBeNull();
    expect((await records.byId(ws.id, idOf(8)))?.axisId).toBe(yId);
    expect(await records.byId(other.id, idOf(8))).toBeNull();
  });

  it('gives the newest record of each parent, a tie to the larger id, none for a parent without records', async () => {
    const latest = await records.latest(ws.id, [xId, yId, emptyAxisId, otherAxisId]);
    expect([...latest.keys()].sort()).toEqual([xId, yId].sort());
    expect(latest.get(xId)?.id).toBe(idOf(6));
    expect(latest.get(yId)?.id).toBe(idOf(8));
    expect(await records.latest(ws.id, [])).toEqual(new Map());
  });

  it('reads the newest record with the same values and types as the query builder', async () => {
    const latest = (await records.latest(ws.id, [yId])).get(yId);
    const byId = await records.byId(ws.id, idOf(8));
    expect(latest).toEqual(byId);
    expect(latest?.createdAt).toBeInstanceOf(Date);
    expect(latest?.createdAt.toISOString()).toBe(yRows[0].at.toISOString());
    expect(latest?.resolution).toBe(0.5);
    expect(latest?.result).toEqual({ backlashMm: 0.002, id: idOf(8) });
  });

  it('deletes only within the workshop', async () => {
    await records.delete(other.id, idOf(1));
    expect(await records.byId(ws.id, idOf(1))).not.toBeNull();
    await records.delete(ws.id, idOf(1));
    expect(await records.byId(ws.id, idOf(1))).toBeNull();
    expect((await records.page(ws.id, xId, null, 50)).map((r) => r.id)).toEqual(
      xNewestFirst.filter((id) => id !== idOf(1)),
    );
  });
});
