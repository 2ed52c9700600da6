import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { RailsRepository } from '../src/rails/rails.repository.js';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';

/**
 * The rails with their newest sweeps in one statement read the same as the rails and their newest
 * sweeps read apart: every column decoded as the query builder decodes it, the rails in order, a
 * rail without sweeps without an entry.
 */
describe('rails with their newest sweeps, in one statement', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Newest sweeps');
  });
  afterAll(() => app.close());

  it('matches the rails and newest sweeps read separately', async () => {
    const machine = await ws.as.builder
      .post('/api/machines')
      .send({ name: 'Newest sweeps router', kind: 'router', workArea: { x: 1200, y: 800 } });
    const rail = (label: string, axis: string) =>
      ws.as.builder
        .post(`/api/machines/${machine.body.id}/rails`)
        .send({ label, axis, length: 600, holePitch: 60, firstHole: 30, profileSize: 20 });
    const y2 = (await rail('Y2 (right)', 'Y')).body.id;
    const y1 = (await rail('Y1 (left)', 'Y')).body.id;
    await rail('X1', 'X');
    const stations = (offset: number) => [0, 200, 400, 600].map((position, i) => ({ position, reading: offset * i }));
    for (const [railId, offset, phase] of [
      [y1, 0.01, 'as-found'],
      [y1, 0.002, 'as-left'],
      [y2, 0.004, 'as-left'],
    ] as const)
      expect(
        (
          await ws.as.builder
            .post(`/api/rails/${railId}/sweeps`)
            .send({ readingUnit: 'mm', phase, datum: 'Frame face', stations: stations(offset) })
        ).status,
      ).toBe(201);

    const repo = app.get(RailsRepository);
    const together = await repo.railsWithNewestSweeps(ws.id, machine.body.id);
    const apart = await repo.listRails(ws.id, machine.body.id);
    expect(together.rails).toEqual(apart);
    expect(together.rails.map((r) => r.label)).toEqual(['X1', 'Y1 (left)', 'Y2 (right)']);
    expect(together.rails[0].createdAt).toBeInstanceOf(Date);
    const latestApart = await repo.latestSweeps(
      ws.id,
      apart.map((r) => r.id),
    );
    expect(together.latest).toEqual(latestApart);
    expect([...together.latest.keys()].sort()).toEqual([y1, y2].sort());
    expect(together.latest.get(y1)).toMatchObject({ phase: 'as-left', stationCount: 4 });
  });
});
