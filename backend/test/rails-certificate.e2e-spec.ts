import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { eq } from 'drizzle-orm';
import { createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';
import { newMachine, requestAndApprove, waiveAllBut } from './support/approval-flow.js';
import { DRIZZLE, type Database } from '../src/database/database.tokens.js';
import { approvals } from '../src/database/schema/index.js';
import type { CheckSeries } from '../src/records/readiness.js';
import { evaluateStraightness } from '../src/engine/straightness.js';

/** What the rails give the approval snapshot, for the certificate's charts. */
describe('rail checks in the approval snapshot', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Rail certificate');
  });
  afterAll(() => app.close());

  it('holds a rail straightness series: residuals per station in the reading unit, the target band as limits', async () => {
    const machineId = await newMachine(ws, 'Charted router');
    const rail = (
      await ws.as.builder
        .post(`/api/machines/${machineId}/rails`)
        .send({ label: 'Y1 (left)', axis: 'Y1', lengthUnit: 'in', length: 32, holePitch: 2.4, firstHole: 1 })
    ).body;
    const positionsIn = [0, 8, 16, 24, 31];
    const readings = [0, 4, 2, 6, 3];
    const sweep = await ws.as.builder.post(`/api/rails/${rail.id}/sweeps`).send({
      readingUnit: 'um',
      lengthUnit: 'in',
      phase: 'as-left',
      resolution: 1,
      stations: positionsIn.map((position, i) => ({ position, reading: readings[i] })),
    });
    expect([sweep.status, sweep.body.message]).toEqual([201, undefined]);
    const key = `straightness:${rail.id}`;
    await waiveAllBut(ws, machineId, (k) => k === key);
    const approval = await requestAndApprove(ws, machineId, TEST_PASSWORD);

    const [row] = await app.get<Database>(DRIZZLE).select().from(approvals).where(eq(approvals.id, approval.id));
    const check = (row.snapshot.checks as { key: string; series?: CheckSeries; warnings?: unknown[] }[]).find(
      (c) => c.key === key,
    )!;
    expect(check.series).toBeDefined();
    const series = check.series!;
    expect(series.x.unit).toBe('in');
    expect(series.y.unit).toBe('µm');
    // Router default: 20 µm judged on the minimum zone (ISO 1101): the band is ±10 µm.
    expect(series.limits!.map((l) => l.value)).toEqual([10, -10]);
    const points = series.lines[0].points;
    expect(points.map((p) => p[0])).toEqual(positionsIn);
    // The residuals' spread is the minimum-zone straightness of the same data through the engine.
    const engine = evaluateStraightness({
      positionsMm: positionsIn.map((p) => p * 25.4),
      readingsMm: readings.map((r) => r / 1000),
    });
    const ys = points.map((p) => p[1]);
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(engine.minimumZone.straightnessMm * 1000, 9);
    // Centred on the zone's middle, so the band reads around zero.
    expect(Math.max(...ys) + Math.min(...ys)).toBeCloseTo(0, 9);
    expect(Array.isArray(check.warnings)).toBe(true);
  });
});
