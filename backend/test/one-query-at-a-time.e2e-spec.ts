import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import pg from 'pg';
import { randomUUID } from 'node:crypto';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, newMachine, screwAxis } from './helpers/drives.js';

/**
 * A connection runs one query at a time: no command hands node-postgres a query while another is
 * still running on the same client (version 8 queues it and calls that deprecated; version 9
 * refuses it). Commands start reads together (`Promise.all`) inside their transaction; the
 * transaction's client lines them up (database/one-query-at-a-time.ts).
 */
interface ClientState {
  _activeQuery: unknown;
  _queryQueue: unknown[];
}

const originalQuery = pg.Client.prototype.query;
let overlaps: string[] = [];

describe('one query at a time on a connection', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;

  beforeAll(async () => {
    pg.Client.prototype.query = function (this: pg.Client, ...args: unknown[]) {
      const state = this as unknown as ClientState;
      if (state._activeQuery || state._queryQueue.length > 0) {
        const q = args[0] as string | { text?: string };
        overlaps.push((typeof q === 'string' ? q : (q?.text ?? '?')).replace(/\s+/g, ' ').slice(0, 120));
      }
      return (originalQuery as (...a: unknown[]) => unknown).apply(this, args);
    } as typeof pg.Client.prototype.query;
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'One query');
  });
  afterAll(async () => {
    pg.Client.prototype.query = originalQuery;
    await app.close();
  });

  it('records checks of every kind, waives one and asks for approval without overlapping queries', async () => {
    overlaps = [];
    const machineId = await newMachine(ws, 'plasma');
    const axisId = await newAxis(ws, machineId, screwAxis('X'));
    const rail = await ws.as.builder
      .post(`/api/machines/${machineId}/rails`)
      .send({ label: 'Y1', axis: 'Y1', length: 800, holePitch: 60, firstHole: 40 });
    const stations = [0, 200, 400, 600, 800].map((position, i) => ({ position, reading: (i % 2) * 0.01 }));
    const answers = [
      await ws.as.builder
        .post(`/api/rails/${rail.body.id}/sweeps`)
        .send({ readingUnit: 'mm', phase: 'as-left', stations }),
      await ws.as.technician
        .post(`/api/axes/${axisId}/travel-trials`)
        .send({ lengthUnit: 'mm', stepsPerMmUsed: 640, moves: [{ commanded: 100, measured: 99.9 }] }),
      await ws.as.technician.post(`/api/axes/${axisId}/backlash-checks`).send({
        lengthUnit: 'mm',
        readingUnit: 'um',
        positions: [
          { position: 10, up: [12, 10, 11], down: [-8, -10, -9] },
          { position: 450, up: [20, 22, 24], down: [5, 4, 6] },
          { position: 880, up: [0, 2, 1], down: [31, 29, 30] },
        ],
      }),
      await ws.as.technician
        .post(`/api/machines/${machineId}/diagonal-checks`)
        .send({ lengthUnit: 'mm', sideX: 1000, sideY: 600, diagonal1: 1166.2, diagonal2: 1166.0 }),
      await ws.as.owner
        .post(`/api/machines/${machineId}/checks/test-cut:${machineId}/waiver`)
        .set('Idempotency-Key', randomUUID())
        .send({ reason: 'No plate on hand this week; cut before the first job.' }),
      await ws.as.owner.post(`/api/machines/${machineId}/approval-requests`).send({}),
      await ws.as.viewer.get(`/api/machines/${machineId}/readiness`),
      await ws.as.viewer.get('/api/machines'),
    ];
    expect(answers.map((a) => a.status).filter((s) => s >= 500)).toEqual([]);
    expect(answers.slice(0, 4).map((a) => a.status)).toEqual([201, 201, 201, 201]);
    expect(overlaps).toEqual([]);
  });
});
