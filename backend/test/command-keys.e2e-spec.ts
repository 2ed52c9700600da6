import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';

/**
 * Entries queued while offline carry a client-made key (Idempotency-Key) and may be sent more than
 * once: the first answer is lost on the way back, the tablet sends again. Each key records once.
 */
describe('commands with a client-made key run once', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Keys');
  });
  afterAll(() => app.close());

  const machine = (name: string) => ({ name, kind: 'router', workArea: { x: 900, y: 600 } });
  const named = async (name: string) =>
    ((await ws.as.viewer.get('/api/machines')).body as { name: string }[]).filter((m) => m.name === name).length;

  it('a repeat gets the first answer and records nothing more', async () => {
    const key = randomUUID();
    const first = await ws.as.owner.post('/api/machines').set('Idempotency-Key', key).send(machine('Keyed router'));
    expect(first.status).toBe(201);
    expect(first.headers['idempotent-replay']).toBeUndefined();
    const again = await ws.as.owner.post('/api/machines').set('Idempotency-Key', key).send(machine('Keyed router'));
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replay']).toBe('true');
    expect(again.body).toEqual(first.body);
    expect(await named('Keyed router')).toBe(1);
  });

  it('parallel sendings of one key record one machine, and all get its answer', async () => {
    const key = randomUUID();
    const answers = await Promise.all(
      Array.from({ length: 6 }, () =>
        ws.as.owner.post('/api/machines').set('Idempotency-Key', key).send(machine('Raced router')),
      ),
    );
    expect(answers.map((a) => a.status)).toEqual(Array(6).fill(201));
    expect(new Set(answers.map((a) => a.body.id)).size).toBe(1);
    expect(await named('Raced router')).toBe(1);
  });

  it('another person’s key is refused (409), never answered from', async () => {
    // A route every role may call, so the refusal comes from the key and not from the role.
    const key = randomUUID();
    const fit = { positions: [0, 100, 200, 300], readings: [0, 0.01, 0.005, 0] };
    const mine = await ws.as.owner.post('/api/calc/straightness').set('Idempotency-Key', key).send(fit);
    expect(mine.status).toBe(200);
    const theirs = await ws.as.viewer.post('/api/calc/straightness').set('Idempotency-Key', key).send(fit);
    expect(theirs.status).toBe(409);
    expect(theirs.body.message).toMatch(/sent by someone else/);
  });

  it('one key for two commands is a 422; a malformed key is a 400 naming the header', async () => {
    const key = randomUUID();
    const created = await ws.as.owner
      .post('/api/machines')
      .set('Idempotency-Key', key)
      .send(machine('Two-command router'));
    expect(created.status).toBe(201);
    const patched = await ws.as.owner
      .patch(`/api/machines/${created.body.id}`)
      .set('Idempotency-Key', key)
      .send({ notes: 'reused key' });
    expect(patched.status).toBe(422);
    expect(patched.body.message).toMatch(/another command/);
    for (const bad of ['short', 'has spaces in it, really', 'x'.repeat(101), '<script>alert(1)</script>xx']) {
      const res = await ws.as.owner
        .post('/api/machines')
        .set('Idempotency-Key', bad)
        .send(machine('Badly keyed router'));
      expect(res.status).toBe(400);
      expect(res.body.message).toMatch(/Idempotency-Key/);
    }
    expect(await named('Badly keyed router')).toBe(0);
  });

  it('a command that failed keeps no key: sent again corrected, it records', async () => {
    const key = randomUUID();
    const refused = await ws.as.owner
      .post('/api/machines')
      .set('Idempotency-Key', key)
      .send({ ...machine('Corrected router'), kind: 'spaceship' });
    expect(refused.status).toBe(400);
    const fixed = await ws.as.owner.post('/api/machines').set('Idempotency-Key', key).send(machine('Corrected router'));
    expect(fixed.status).toBe(201);
    expect(fixed.headers['idempotent-replay']).toBeUndefined();
    expect(await named('Corrected router')).toBe(1);
  });

  it('commands without a key behave as before: two sendings, two records', async () => {
    await ws.as.owner.post('/api/machines').send(machine('Unkeyed router'));
    await ws.as.owner.post('/api/machines').send(machine('Unkeyed router'));
    expect(await named('Unkeyed router')).toBe(2);
  });
});
