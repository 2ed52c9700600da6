import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import fc from 'fast-check';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, newMachine, screwAxis } from './helpers/drives.js';

/**
 * Generated bad input on the backlash and test-program routes: never a 5xx, every refusal a 4xx
 * with a message, nothing stored from a refused body, and every list still loads afterwards.
 * Seeded and bounded (fast-check) so it runs in seconds.
 */
const SEED = 20261202;
const BAD: unknown[] = [
  null,
  '',
  '\u0000',
  'a\u0000b',
  '\ud800',
  'x'.repeat(5000),
  1e308,
  -1e308,
  -0,
  'NaN',
  true,
  [],
  {},
  [[[[[[]]]]]],
  Array.from({ length: 5000 }, () => 1),
  '(G0 X-500)',
  'a\nG0 X-500',
];

const valid = () => ({
  lengthUnit: 'mm',
  readingUnit: 'um',
  resolution: 1,
  notes: 'dial on the carriage',
  positions: [
    { position: 10, up: [12, 10, 11], down: [-8, -10, -9] },
    { position: 460, up: [20, 22, 24], down: [5, 4, 6] },
    { position: 900, up: [0, 2, 1], down: [31, 29, 30] },
  ],
});

function paths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (value === null || typeof value !== 'object') return [prefix];
  const entries = Array.isArray(value) ? value.map((v, i) => [i, v] as const) : Object.entries(value);
  return [prefix, ...entries.flatMap(([k, v]) => paths(v, [...prefix, k]))];
}
function setAt(body: unknown, path: (string | number)[], value: unknown, drop: boolean): unknown {
  if (path.length === 0) return value;
  const copy = (Array.isArray(body) ? [...body] : { ...(body as object) }) as Record<string | number, unknown>;
  const [head, ...rest] = path;
  if (rest.length === 0 && drop) delete copy[head];
  else copy[head] = setAt(copy[head], rest, value, drop);
  return copy;
}

describe('fuzz: backlash checks and test programs', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let axisId: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Backlash fuzz');
    axisId = await newAxis(ws, await newMachine(ws, 'router'), screwAxis('X'));
  });
  afterAll(() => app.close());

  it('no generated body gets a 5xx; a refusal names what is wrong and stores nothing', async () => {
    const all = paths(valid());
    const fields = all.filter((p) => p.length > 0);
    const body = fc.oneof(
      {
        weight: 6,
        arbitrary: fc
          .tuple(fc.constantFrom(...all), fc.constantFrom(...BAD))
          .map(([p, v]) => setAt(valid(), p, v, false)),
      },
      {
        weight: 2,
        arbitrary: fc
          .tuple(fc.constantFrom(...fields), fc.jsonValue({ maxDepth: 3 }))
          .map(([p, v]) => setAt(valid(), p, v, false)),
      },
      { weight: 1, arbitrary: fc.constantFrom(...fields).map((p) => setAt(valid(), p, undefined, true)) },
      { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 4 }) },
    );
    let stored = 0;
    const problems: string[] = [];
    await fc.assert(
      fc.asyncProperty(body, async (b) => {
        const res = await ws.as.technician
          .post(`/api/axes/${axisId}/backlash-checks`)
          .set('Content-Type', 'application/json')
          .send(JSON.stringify(b) ?? 'null');
        if (res.status === 201) stored++;
        else if (res.status >= 500 || res.status < 400 || !res.body.message)
          problems.push(`${res.status} for ${JSON.stringify(b).slice(0, 200)}`);
        return res.status < 500;
      }),
      { seed: SEED, numRuns: 60, endOnFailure: true },
    );
    expect(problems).toEqual([]);
    const list = await ws.as.viewer.get(`/api/axes/${axisId}/backlash-checks`);
    expect(list.status).toBe(200);
    expect(list.body).toHaveLength(stored);
    expect((await ws.as.viewer.get(`/api/axes/${axisId}/backlash-checks`)).status).toBe(200);
  });

  it('no generated query of the test program or its targets gets a 5xx', async () => {
    const key = fc.constantFrom(
      'kind',
      'lengthUnit',
      'feed',
      'distances',
      'targets',
      'start',
      'runs',
      'overrun',
      'dwell',
      'letter',
      'notes',
      'format',
      'unit',
    );
    const value = fc.oneof(
      fc.string({ maxLength: 40 }),
      fc.constantFrom(
        'positioning',
        'travel',
        'in',
        'thou',
        '1e308',
        '-1',
        '0',
        'NaN',
        '1,2,3',
        '(',
        ')\nG0 X-500',
        '%',
        ';',
      ),
    );
    const query = fc.dictionary(key, value, { maxKeys: 6 });
    const failures: string[] = [];
    await fc.assert(
      fc.asyncProperty(query, fc.boolean(), async (q, targets) => {
        const res = await ws.as.technician
          .get(`/api/axes/${axisId}/${targets ? 'test-targets' : 'test-program'}`)
          .query(q);
        if (res.status >= 500) failures.push(`${res.status} for ${JSON.stringify(q)}`);
        if (res.status === 200 && !targets) {
          // Whatever was asked, a program holds no line a person's text could have made.
          for (const line of res.text.split('\n')) if (line && line !== '%') expect(line).toMatch(/^(\(|G|M)/);
        }
        return res.status < 500;
      }),
      { seed: SEED, numRuns: 80, endOnFailure: true },
    );
    expect(failures).toEqual([]);
  });
});
