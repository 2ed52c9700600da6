import { jest } from '@jest/globals';
import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { and, eq, sql } from 'drizzle-orm';
import { PgDialect } from 'drizzle-orm/pg-core';
import { randomUUID } from 'node:crypto';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { compiledQuery, compiledSql, keysShape, slotsOf, type Slots } from '../src/database/compiled-statement.js';
import { DRIZZLE, type Database } from '../src/database/database.tokens.js';
import { TransactionContext } from '../src/database/transaction-context.js';
import { machineReadiness, machines, targetSets } from '../src/database/schema/index.js';

/**
 * A compiled statement answers exactly what the same drizzle statement answers when built each
 * time (rows mapped the same: dates, JSON, a left join's missing side), builds its SQL once per
 * shape, fills values as drizzle does (JSON for a jsonb column, a left-out column keeps its
 * default), and runs inside the command's transaction.
 */
describe('compiled statements', () => {
  let app: NestFastifyApplication;
  let db: Database;
  let ws: TestWorkshop;
  let machineIds: string[];
  const built = jest.spyOn(PgDialect.prototype, 'sqlToQuery');

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get<Database>(DRIZZLE);
    ws = await createTestWorkshop(app, 'Compiled');
    machineIds = [];
    for (const name of ['Table one', 'Table two']) {
      const res = await ws.as.builder
        .post('/api/machines')
        .send({ name, kind: 'router', workArea: { x: 1200, y: 800 } });
      machineIds.push(res.body.id);
    }
  });
  afterAll(() => app.close());

  const machineWithSet = (s: Slots<{ workshopId: string; machineId: string }>) =>
    db
      .select({ machine: machines, setName: targetSets.name, targets: targetSets.targets, summary: machineReadiness })
      .from(machines)
      .innerJoin(targetSets, eq(targetSets.id, machines.targetSetId))
      .leftJoin(machineReadiness, and(eq(machineReadiness.machineId, machines.id), sql`false`))
      .where(and(eq(machines.workshopId, s.workshopId), eq(machines.id, s.machineId)));

  it('a select answers what the builder answers, built once for every call', async () => {
    const compiled = compiledQuery(machineWithSet);
    for (const machineId of [...machineIds, randomUUID()]) {
      const values = { workshopId: ws.id, machineId };
      const direct = await machineWithSet({
        workshopId: values.workshopId,
        machineId: values.machineId,
      } as unknown as Slots<typeof values>);
      built.mockClear();
      const answer = await compiled(db, values);
      expect(answer).toEqual(direct);
      if (machineId !== machineIds[0]) expect(built).not.toHaveBeenCalled();
    }
    const [first] = await compiled(db, { workshopId: ws.id, machineId: machineIds[0] });
    expect(first.machine.createdAt).toBeInstanceOf(Date);
    expect(first.summary).toBeNull();
    expect(typeof first.targets).toBe('object');
    expect(compiled.builtShapes()).toBe(1);
  });

  it('an insert fills its values as drizzle does, one shape per set of columns', async () => {
    type Values = typeof targetSets.$inferInsert;
    const insert = compiledQuery(
      (s: Slots<Values>, values: Values) =>
        db
          .insert(targetSets)
          .values(slotsOf(s, values) as never)
          .returning(),
      keysShape,
    );
    const targets = { railStraightness: { value: 0.05, unit: 'mm' as const, reference: 'minimum-zone' as const } };
    const [plain] = await insert(db, { workshopId: ws.id, name: 'Compiled A', targets });
    const [described] = await insert(db, { workshopId: ws.id, name: 'Compiled B', targets, description: 'with words' });
    const [again] = await insert(db, { workshopId: ws.id, name: 'Compiled C', targets, description: undefined });
    expect(insert.builtShapes()).toBe(2);
    // The left-out description took its column's default; the JSON went in as JSON.
    expect(plain).toMatchObject({ name: 'Compiled A', description: '', targets });
    expect(described).toMatchObject({ name: 'Compiled B', description: 'with words', targets });
    expect(again.description).toBe('');
    const [stored] = await db.select().from(targetSets).where(eq(targetSets.id, described.id));
    expect(stored).toEqual(described);
    const kind = await db.execute<{ kind: string }>(
      sql`select jsonb_typeof(targets) as kind from ${targetSets} where id = ${plain.id}`,
    );
    expect(kind.rows[0].kind).toBe('object');
  });

  it('raw SQL answers its rows as objects; a value inside it goes as it is', async () => {
    const names = compiledSql<{ name: string; twice: number }, { machineId: string; n: number }>(
      (s) => sql`select name, ${s.n}::int * 2 as twice from ${machines} where id = ${s.machineId}`,
    );
    expect((await names(db, { machineId: machineIds[1], n: 21 })).rows).toEqual([{ name: 'Table two', twice: 42 }]);
    expect((await names(db, { machineId: randomUUID(), n: 1 })).rows).toEqual([]);
  });

  it('inside a command it runs in the command’s transaction: a failed command leaves nothing', async () => {
    const context = app.get(TransactionContext);
    type Values = typeof targetSets.$inferInsert;
    const insert = compiledQuery(
      (s: Slots<Values>, values: Values) =>
        db
          .insert(targetSets)
          .values(slotsOf(s, values) as never)
          .returning({ id: targetSets.id }),
      keysShape,
    );
    const count = compiledSql<{ n: number }, { workshopId: string; name: string }>(
      (s) => sql`select count(*)::int as n from ${targetSets} where workshop_id = ${s.workshopId} and name = ${s.name}`,
    );
    const name = `Rolled back ${randomUUID()}`;
    let seenInside = -1;
    await expect(
      context.run(async () => {
        await insert(db, { workshopId: ws.id, name, targets: {} });
        seenInside = (await count(db, { workshopId: ws.id, name })).rows[0].n;
        throw new Error('the command fails after its insert');
      }),
    ).rejects.toThrow('the command fails');
    expect(seenInside).toBe(1);
    expect((await count(db, { workshopId: ws.id, name })).rows[0].n).toBe(0);
  });
});
