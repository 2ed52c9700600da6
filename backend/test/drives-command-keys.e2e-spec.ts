import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { newAxis, newMachine } from './helpers/drives.js';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { makePng } from './evidence-fixtures.js';

/**
 * Trials, runs, frame checks and photos typed offline are sent with the key made when they were
 * typed, perhaps more than once (the answer lost on the way back, a reload mid-send): each key is
 * recorded once, and a repeat gets the first answer.
 */
describe('drive, frame and photo entries with a client-made key are recorded once', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let machineId: string;
  let axisId: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Entry keys');
    machineId = await newMachine(ws);
    axisId = await newAxis(ws, machineId);
  });
  afterAll(() => app.close());

  const trial = {
    lengthUnit: 'mm',
    readingUnit: 'mm',
    moves: [
      { commanded: 200, measured: 199.8 },
      { commanded: 400, measured: 399.6 },
      { commanded: 800, measured: 799.2 },
    ],
  };
  const listOf = (body: unknown) => (Array.isArray(body) ? body : (body as { items: unknown[] }).items);

  it('a travel trial sent three times, twice at once, is one trial with all three moves', async () => {
    const key = randomUUID();
    const first = await ws.as.technician
      .post(`/api/axes/${axisId}/travel-trials`)
      .set('Idempotency-Key', key)
      .send(trial);
    expect(first.status).toBe(201);
    const again = await Promise.all(
      [0, 1].map(() =>
        ws.as.technician.post(`/api/axes/${axisId}/travel-trials`).set('Idempotency-Key', key).send(trial),
      ),
    );
    expect(again.map((a) => a.status)).toEqual([201, 201]);
    expect(again.map((a) => a.body.id)).toEqual([first.body.id, first.body.id]);
    expect(again.every((a) => a.headers['idempotent-replay'] === 'true')).toBe(true);
    const list = await ws.as.viewer.get(`/api/axes/${axisId}/travel-trials`);
    expect(listOf(list.body)).toHaveLength(1);
    const full = await ws.as.viewer.get(`/api/axes/${axisId}/travel-trials/${first.body.id}`);
    expect(full.body.moves).toHaveLength(3);
  });

  it('a diagonal check sent twice is one check', async () => {
    const key = randomUUID();
    const body = { lengthUnit: 'mm', sideX: 800, sideY: 500, diagonal1: 943.4, diagonal2: 943.6 };
    const answers = await Promise.all(
      [0, 1].map(() =>
        ws.as.builder.post(`/api/machines/${machineId}/diagonal-checks`).set('Idempotency-Key', key).send(body),
      ),
    );
    expect(answers.map((a) => a.status)).toEqual([201, 201]);
    expect(answers[0].body.id).toBe(answers[1].body.id);
    expect(listOf((await ws.as.viewer.get(`/api/machines/${machineId}/diagonal-checks`)).body)).toHaveLength(1);
  });

  it('a photo sent twice as multipart is one piece of evidence; the repeat gets the first answer', async () => {
    const key = randomUUID();
    const png = await makePng(40, 30);
    const send = () =>
      ws.as.builder
        .post('/api/evidence')
        .set('Idempotency-Key', key)
        .field('subjectType', 'machine')
        .field('subjectId', machineId)
        .attach('file', png, 'gantry.png');
    const first = await send();
    expect(first.status).toBe(201);
    const again = await send();
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replay']).toBe('true');
    expect(again.body.id).toBe(first.body.id);
    const list = await ws.as.viewer.get(`/api/evidence?machineId=${machineId}`);
    expect(listOf(list.body)).toHaveLength(1);
  });
});
