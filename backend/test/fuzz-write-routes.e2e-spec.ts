import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import fc from 'fast-check';
import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { createApp } from '../src/create-app.js';
import { bodyFromSchema, jsonBodySchema, type OpenApiDocument } from './helpers/body-from-schema.js';
import { createTestWorkshop, type Agent, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, newMachine, screwAxis } from './helpers/drives.js';

/**
 * Generated bad bodies against every write route: whatever arrives, the answer is never a 5xx,
 * and afterwards every list still loads. Seeded and bounded so it runs in seconds.
 * Each route starts from a body it accepts; the generator then breaks one field (null, control
 * characters, numbers too large, wrong types, deep nesting, huge lists), drops or adds one, or
 * sends arbitrary JSON.
 *
 * The routes come from the API description (backend/openapi.json, which the openapi spec holds
 * equal to what the server serves): a write route without a body written below starts from one
 * built from its request schema, so a new route is fuzzed without an entry here.
 */
const SEED = 20261202;
const RUNS_PER_ROUTE = 12;

type Role = keyof TestWorkshop['as'];
interface Route {
  method: 'post' | 'put' | 'patch';
  path: () => string;
  /** Who sends it; a route found in the description goes with the first role it does not refuse. */
  role?: Role;
  body: () => Record<string, unknown>;
}

const DOCUMENT = JSON.parse(readFileSync(new URL('../openapi.json', import.meta.url), 'utf8')) as OpenApiDocument;

/**
 * Write routes of the description left out, each with its reason. Everything else is fuzzed.
 */
const NOT_FUZZED: Record<string, string> = {
  'POST /api/auth/logout': 'it has no body and ends the session it is sent on',
  'POST /api/evidence': 'a multipart upload: evidence-uploads.e2e-spec.ts sends it bad files',
};

/** Roles tried in turn on a described route until one is not refused. */
const ROLES_TO_TRY: Role[] = ['owner', 'technician', 'builder', 'admin', 'viewer'];

const BAD_VALUES: unknown[] = [
  null,
  '',
  '\u0000',
  'a\u0000b',
  'line\u0007bell',
  '\ud800',
  'x'.repeat(5000),
  1e308,
  -1e308,
  1e-320,
  -0,
  Number.MAX_SAFE_INTEGER + 2,
  'NaN',
  'Infinity',
  true,
  [],
  {},
  [[[[[[[[[[]]]]]]]]]],
  { __proto__: { admin: true } },
  Array.from({ length: 5000 }, () => 1e308),
  '00000000-0000-0000-0000-000000000000',
  '../../etc/passwd',
];

/** Every key path of a JSON body (objects and array elements), for the generator to pick from. */
function paths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (value === null || typeof value !== 'object') return [prefix];
  const entries = Array.isArray(value) ? value.slice(0, 3).map((v, i) => [i, v] as const) : Object.entries(value);
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

const mutation = (valid: Record<string, unknown>) => {
  const all = paths(valid);
  const fields = all.filter((p) => p.length > 0);
  const generators = [
    {
      weight: 6,
      arbitrary: fc
        .tuple(fc.constantFrom(...all), fc.constantFrom(...BAD_VALUES))
        .map(([p, v]) => setAt(valid, p, v, false)),
    },
    {
      weight: 1,
      arbitrary: fc
        .tuple(fc.string({ maxLength: 12 }), fc.jsonValue({ maxDepth: 2 }))
        .map(([k, v]) => ({ ...valid, [k]: v })),
    },
    { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 4 }) },
  ];
  if (fields.length) {
    generators.push(
      {
        weight: 2,
        arbitrary: fc
          .tuple(fc.constantFrom(...fields), fc.jsonValue({ maxDepth: 3 }))
          .map(([p, v]) => setAt(valid, p, v, false)),
      },
      { weight: 1, arbitrary: fc.constantFrom(...fields).map((p) => setAt(valid, p, undefined, true)) },
    );
  }
  return fc.oneof(...generators);
};

describe('fuzz: generated bad bodies on every write route', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  const ids: Record<string, string> = {};
  const fuzzAddress = `192.0.2.${(SEED % 200) + 20}`;

  beforeAll(async () => {
    // Through a trusted proxy with a documentation address, so the sign-in fuzzing counts against
    // an address of its own rather than the one every other spec signs in from.
    app = await createApp({ ...process.env, FRONTEND_DIST: '', TRUST_PROXY: 'true' });
    await app.init();
    await app.getHttpAdapter().getInstance().ready();
    ws = await createTestWorkshop(app, 'Fuzz');
    ids.machine = await newMachine(ws, 'plasma');
    ids.axis = await newAxis(ws, ids.machine, screwAxis('X'));
    const rail = await ws.as.builder
      .post(`/api/machines/${ids.machine}/rails`)
      .send({ label: 'Y1 (left)', axis: 'Y1', length: 800, holePitch: 60, firstHole: 40 });
    ids.rail = rail.body.id;
    ids.boltDown = (
      await ws.as.builder.post(`/api/rails/${ids.rail}/bolt-downs`).send({ mode: 'line', readingUnit: 'um' })
    ).body.id;
    ids.trial = (
      await ws.as.technician
        .post(`/api/axes/${ids.axis}/travel-trials`)
        .send({ lengthUnit: 'mm', stepsPerMmUsed: 640, moves: [{ commanded: 100, measured: 99.8 }] })
    ).body.id;
    ids.targetSet = (await ws.as.owner.get('/api/target-sets')).body[0].id;
    // A person of their own: the people routes change and mail whoever they name.
    ids.person = (
      await ws.as.admin.post('/api/people').send({
        name: 'Fuzz Subject',
        email: `fuzz.subject.${randomUUID().slice(0, 8)}@test.example.com`,
        role: 'viewer',
      })
    ).body.person.id;
    ids.sweep = (
      await ws.as.builder.post(`/api/rails/${ids.rail}/sweeps`).send({
        readingUnit: 'mm',
        phase: 'as-found',
        stations: [0, 200, 400].map((position) => ({ position, reading: 0 })),
      })
    ).body.id;
    ids.holePattern = (await ws.as.builder.post(`/api/machines/${ids.machine}/hole-patterns`).send(bracket())).body.id;
    const walk = (await ws.as.viewer.get(`/api/machines/${ids.machine}/safety-walk`)).body;
    ids.safetyItem =
      (walk.items ?? walk.sections?.flatMap((s: { items: { id: string }[] }) => s.items) ?? [])[0]?.id ?? randomUUID();
    for (const [k, v] of Object.entries(ids)) if (typeof v !== 'string') throw new Error(`fixture ${k} missing`);
  });
  afterAll(() => app.close());

  const bracket = () => ({
    name: 'Fuzz bracket',
    reference: 'bottom-left',
    width: 100,
    height: 80,
    entry: 'list',
    holes: [
      { x: 10, y: 10, diameter: 5 },
      { x: 90, y: 70, diameter: 5 },
    ],
  });
  const stations = [0, 100, 200, 300, 400, 500, 600, 700].map((position, i) => ({
    position,
    reading: (i % 3) * 0.002,
  }));
  const routes: Record<string, Route> = {
    'POST /api/auth/login': {
      method: 'post',
      path: () => '/api/auth/login',
      role: 'viewer',
      body: () => ({ email: 'nobody@test.example.com', password: 'not the password' }),
    },
    'POST /api/auth/password-reset': {
      method: 'post',
      path: () => '/api/auth/password-reset',
      role: 'viewer',
      body: () => ({ token: 'A'.repeat(30), password: 'a long enough password' }),
    },
    'POST /api/machines': {
      method: 'post',
      path: () => '/api/machines',
      role: 'owner',
      body: () => ({
        name: `Fuzz ${randomUUID().slice(0, 6)}`,
        kind: 'router',
        workArea: { x: 900, y: 600 },
        notes: 'bench\nnotes',
      }),
    },
    'PATCH /api/machines/:id': {
      method: 'patch',
      path: () => `/api/machines/${ids.machine}`,
      role: 'owner',
      body: () => ({ notes: 'new notes', name: `Fuzz machine ${randomUUID().slice(0, 6)}` }),
    },
    'POST /api/machines/:id/rails': {
      method: 'post',
      path: () => `/api/machines/${ids.machine}/rails`,
      role: 'builder',
      body: () => ({ label: 'X1', axis: 'X', length: 1000, holePitch: 60, firstHole: 20, profileSize: 15 }),
    },
    'PATCH /api/rails/:id': {
      method: 'patch',
      path: () => `/api/rails/${ids.rail}`,
      role: 'builder',
      body: () => ({ label: 'Y1 (left)', holePitch: 60 }),
    },
    'POST /api/rails/:id/sweeps': {
      method: 'post',
      path: () => `/api/rails/${ids.rail}/sweeps`,
      role: 'builder',
      body: () => ({
        readingUnit: 'mm',
        phase: 'as-left',
        stations,
        notes: 'ok',
        instrument: 'dial',
        temperatureC: 20,
      }),
    },
    'POST /api/rails/:id/bolt-downs': {
      method: 'post',
      path: () => `/api/rails/${ids.rail}/bolt-downs`,
      role: 'builder',
      body: () => ({ mode: 'line', readingUnit: 'um' }),
    },
    'PUT /api/bolt-downs/:id/holes/:index': {
      method: 'put',
      path: () => `/api/bolt-downs/${ids.boltDown}/holes/1`,
      role: 'builder',
      body: () => ({ reading: 0.001, fixed: false, writeId: randomUUID() }),
    },
    'POST /api/bolt-downs/:id/final-sweep': {
      method: 'post',
      path: () => `/api/bolt-downs/${ids.boltDown}/final-sweep`,
      role: 'builder',
      body: () => ({ readingUnit: 'um', phase: 'as-left', stations }),
    },
    'POST /api/machines/:id/axes': {
      method: 'post',
      path: () => `/api/machines/${ids.machine}/axes`,
      role: 'technician',
      body: () => screwAxis('Z'),
    },
    'PATCH /api/axes/:id': {
      method: 'patch',
      path: () => `/api/axes/${ids.axis}`,
      role: 'technician',
      body: () => ({ maxFeedRate: 4000, measuredTravelMm: 900 }),
    },
    'POST /api/axes/:id/travel-trials': {
      method: 'post',
      path: () => `/api/axes/${ids.axis}/travel-trials`,
      role: 'technician',
      body: () => ({
        lengthUnit: 'mm',
        stepsPerMmUsed: 640,
        moves: [
          { commanded: 100, measured: 99.8 },
          { commanded: 300, measured: 299.5 },
        ],
      }),
    },
    'POST /api/axes/:id/positioning-runs': {
      method: 'post',
      path: () => `/api/axes/${ids.axis}/positioning-runs`,
      role: 'technician',
      body: () => ({
        readingUnit: 'um',
        targets: [10, 20],
        runs: [
          { direction: 'up', deviations: [1, 2] },
          { direction: 'up', deviations: [2, 2] },
          { direction: 'down', deviations: [0, 1] },
          { direction: 'down', deviations: [-1, 0] },
        ],
      }),
    },
    'POST /api/machines/:id/diagonal-checks': {
      method: 'post',
      path: () => `/api/machines/${ids.machine}/diagonal-checks`,
      role: 'technician',
      body: () => ({ lengthUnit: 'mm', sideX: 1000, sideY: 600, diagonal1: 1166.2, diagonal2: 1166.0 }),
    },
    'POST /api/machines/:id/bed-grids': {
      method: 'post',
      path: () => `/api/machines/${ids.machine}/bed-grids`,
      role: 'technician',
      body: () => ({
        lengthUnit: 'mm',
        readingUnit: 'mm',
        columns: 2,
        rows: 2,
        points: [
          { x: 0, y: 0, z: 0 },
          { x: 100, y: 0, z: 0.01 },
          { x: 0, y: 100, z: 0 },
          { x: 100, y: 100, z: 0.02 },
        ],
      }),
    },
    'POST /api/machines/:id/test-cuts': {
      method: 'post',
      path: () => `/api/machines/${ids.machine}/test-cuts`,
      role: 'technician',
      body: () => ({
        lengthUnit: 'mm',
        nominal: { x: 300, y: 300, circle: 100 },
        measured: { x: 299.9, y: 300.1, diagonal1: 424.2, diagonal2: 424.3, circleX: 100, circleY: 100.1 },
        plateThickness: 6,
      }),
    },
    'POST /api/axes/:id/backlash-checks': {
      method: 'post',
      path: () => `/api/axes/${ids.axis}/backlash-checks`,
      role: 'technician',
      body: () => ({
        lengthUnit: 'mm',
        readingUnit: 'um',
        resolution: 1,
        positions: [
          { position: 10, up: [12, 10, 11], down: [-8, -10, -9] },
          { position: 450, up: [20, 22, 24], down: [5, 4, 6] },
          { position: 880, up: [0, 2, 1], down: [31, 29, 30] },
        ],
      }),
    },
    'PUT /api/machines/:id/safety-walk/items/:itemId': {
      method: 'put',
      path: () => `/api/machines/${ids.machine}/safety-walk/items/${ids.safetyItem}`,
      role: 'owner',
      body: () => ({ answer: 'yes', note: 'checked' }),
    },
    'POST /api/machines/:id/safety-walk/rounds': {
      method: 'post',
      path: () => `/api/machines/${ids.machine}/safety-walk/rounds`,
      role: 'owner',
      body: () => ({}),
    },
    'POST /api/safety-items': {
      method: 'post',
      path: () => '/api/safety-items',
      role: 'owner',
      body: () => ({ section: 'cutting', text: 'Slag bin emptied' }),
    },
    'POST /api/target-sets': {
      method: 'post',
      path: () => '/api/target-sets',
      role: 'owner',
      body: () => ({
        name: `Set ${randomUUID().slice(0, 6)}`,
        description: 'fuzz',
        targets: { railStraightness: { value: 0.05, unit: 'mm' } },
      }),
    },
    'PATCH /api/target-sets/:id': {
      method: 'patch',
      path: () => `/api/target-sets/${ids.targetSet}`,
      role: 'owner',
      body: () => ({ description: 'Edited' }),
    },
    'POST /api/people': {
      method: 'post',
      path: () => '/api/people',
      role: 'admin',
      body: () => ({ name: 'Fuzz Person', email: `fuzz.${randomUUID().slice(0, 8)}@test.example.com`, role: 'viewer' }),
    },
    'PATCH /api/people/:id': {
      method: 'patch',
      path: () => `/api/people/${ids.person}`,
      role: 'admin',
      body: () => ({ role: 'viewer', name: 'Viewer' }),
    },
    'POST /api/machines/:id/checks/:checkId/waiver': {
      method: 'post',
      path: () => `/api/machines/${ids.machine}/checks/travel-trial:${ids.axis}/waiver`,
      role: 'owner',
      body: () => ({ reason: 'A reason long enough to count.' }),
    },
    'POST /api/machines/:id/approval-requests': {
      method: 'post',
      path: () => `/api/machines/${ids.machine}/approval-requests`,
      role: 'owner',
      body: () => ({}),
    },
    'POST /api/machines/:id/approvals': {
      method: 'post',
      path: () => `/api/machines/${ids.machine}/approvals`,
      role: 'owner',
      body: () => ({ password: 'not the password', statement: 'I approve.' }),
    },
    'POST /api/machines/:id/reopen': {
      method: 'post',
      path: () => `/api/machines/${ids.machine}/reopen`,
      role: 'owner',
      body: () => ({ reason: 'Rail knocked by a trolley' }),
    },
    // A pattern's holes are required only for a list entry, which the description cannot say.
    'POST /api/machines/:id/hole-patterns': {
      method: 'post',
      path: () => `/api/machines/${ids.machine}/hole-patterns`,
      role: 'builder',
      body: bracket,
    },
    'PUT /api/hole-patterns/:id': {
      method: 'put',
      path: () => `/api/hole-patterns/${ids.holePattern}`,
      role: 'builder',
      body: bracket,
    },
    'POST /api/hole-patterns/preview': {
      method: 'post',
      path: () => '/api/hole-patterns/preview',
      role: 'viewer',
      body: bracket,
    },
    ...Object.fromEntries(
      (
        [
          ['straightness', { positions: [0, 100, 200, 300], readings: [0, 3, 7, 8], readingUnit: 'um' }],
          ['parallelism', { positions: [0, 250, 500], railA: [0, 0.01, 0.02], railB: [0.1, 0.12, 0.11] }],
          ['squareness', { sideX: 1000, sideY: 600, diagonal1: 1166.2, diagonal2: 1166.0 }],
          [
            'flatness',
            {
              points: [
                { x: 0, y: 0, z: 0 },
                { x: 100, y: 0, z: 0 },
                { x: 0, y: 100, z: 0 },
                { x: 100, y: 100, z: 1 },
              ],
              readingUnit: 'um',
            },
          ],
          ['drive', { type: 'belt', motorStepsPerRev: 200, microsteps: 16, beltPitch: 2, pulleyTeeth: 20 }],
          ['travel-trial', { stepsPerMmUsed: 640, moves: [{ commanded: 100, measured: 99.8 }] }],
          [
            'positioning',
            {
              targets: [0, 100],
              runs: [
                { direction: 'up', deviations: [1, 0] },
                { direction: 'up', deviations: [3, 0] },
                { direction: 'down', deviations: [-1, 2] },
                { direction: 'down', deviations: [-1, 4] },
              ],
              readingUnit: 'um',
            },
          ],
          [
            'screw-speed',
            {
              nominalDiameter: 16,
              rootDiameter: 12.9,
              unsupportedLength: 1000,
              lead: 5,
              mounting: 'fixed-supported',
              feedRate: 5000,
            },
          ],
          [
            'bolt-down',
            { length: 600, pitch: 60, firstHoleOffset: 30, mode: 'line', readings: [{ hole: 0, reading: 0 }] },
          ],
          ['travel-envelope', { axes: [{ name: 'X', measuredTravel: 1000, workSize: 900 }] }],
          ['test-cut', { x: { commanded: 100, measured: 100.1 }, y: { commanded: 100, measured: 99.9 } }],
        ] as [string, Record<string, unknown>][]
      ).map(([name, body]) => [
        `POST /api/calc/${name}`,
        { method: 'post', path: () => `/api/calc/${name}`, role: 'viewer', body: () => body } as Route,
      ]),
    ),
  };

  /** Which fixture a path parameter names, by the segment before it. */
  const fixtureFor = (segment: string, param: string): string => {
    const fixtures: Record<string, () => string> = {
      'machines/{id}': () => ids.machine,
      'rails/{id}': () => ids.rail,
      'axes/{id}': () => ids.axis,
      'bolt-downs/{id}': () => ids.boltDown,
      'sweeps/{id}': () => ids.sweep,
      'target-sets/{id}': () => ids.targetSet,
      'people/{id}': () => ids.person,
      'hole-patterns/{id}': () => ids.holePattern,
      'holes/{index}': () => '1',
      'items/{itemId}': () => ids.safetyItem,
      'travel-trials/{trialId}': () => ids.trial,
      'checks/{checkId}': () => `travel-trial:${ids.axis}`,
    };
    const fixture = fixtures[`${segment}/{${param}}`];
    if (!fixture) throw new Error(`No fixture for {${param}} after /${segment}/: add one to fixtureFor`);
    return fixture();
  };
  const described: [string, Route][] = Object.entries(DOCUMENT.paths).flatMap(([path, item]) =>
    (['post', 'put', 'patch'] as const)
      .filter((method) => item[method])
      .map((method): [string, Route] => {
        const schema = jsonBodySchema(item[method]);
        return [
          `${method.toUpperCase()} ${path}`,
          {
            method,
            path: () =>
              path.replace(/([^/]+)\/\{(\w+)\}/g, (_, segment, param) => `${segment}/${fixtureFor(segment, param)}`),
            body: () => (schema ? (bodyFromSchema(DOCUMENT, schema) as Record<string, unknown>) : {}),
          },
        ];
      }),
  );
  const byDescribedName = (name: string) => name.replace(/:(\w+)/g, '{$1}');
  const handWritten = new Set(Object.keys(routes).map(byDescribedName));
  for (const [name, route] of described) if (!handWritten.has(name) && !(name in NOT_FUZZED)) routes[name] = route;

  /** The role a route is sent as: its own, or the first of ROLES_TO_TRY that is neither refused nor signed out. */
  const roleFor = async (route: Route): Promise<Role> => {
    if (route.role) return route.role;
    for (const role of ROLES_TO_TRY) {
      const res = await send(ws.as[role], route, route.body());
      if (res.status !== 401 && res.status !== 403) return role;
    }
    throw new Error(`every role is refused on ${route.method} ${route.path()}`);
  };

  const send = (agent: Agent, route: Route, body: unknown) =>
    agent[route.method](route.path())
      .set('X-Forwarded-For', fuzzAddress)
      .set('Content-Type', 'application/json')
      .send(JSON.stringify(body) ?? 'null');

  it.each(Object.keys(routes))('%s: no generated body gets a 5xx', async (name) => {
    const route = routes[name];
    const agent = ws.as[await roleFor(route)];
    const failures: string[] = [];
    await fc.assert(
      fc.asyncProperty(mutation(route.body()), async (body) => {
        const res = await send(agent, route, body);
        if (res.status >= 500) failures.push(`${res.status} for ${JSON.stringify(body).slice(0, 300)}`);
        return res.status < 500;
      }),
      { seed: SEED, numRuns: RUNS_PER_ROUTE, endOnFailure: true },
    );
    expect(failures).toEqual([]);
  });

  it('fuzzes every write route of the description but the ones left out with a reason', () => {
    const describedNames = new Set(described.map(([name]) => name));
    expect(Object.keys(NOT_FUZZED).filter((name) => !describedNames.has(name))).toEqual([]);
    expect([...handWritten].filter((name) => !describedNames.has(name))).toEqual([]);
    const fuzzed = new Set(Object.keys(routes).map(byDescribedName));
    expect([...describedNames].filter((name) => !fuzzed.has(name) && !(name in NOT_FUZZED))).toEqual([]);
    expect(describedNames.size).toBeGreaterThan(40);
  });

  it('afterwards every role is still signed in', async () => {
    for (const role of Object.keys(ws.as) as Role[])
      expect({ role, status: (await ws.as[role].get('/api/auth/me')).status }).toEqual({ role, status: 200 });
  });

  it('afterwards every list still loads, for a viewer', async () => {
    const v = ws.as.viewer;
    const lists = [
      '/api/machines',
      `/api/machines/${ids.machine}`,
      `/api/machines/${ids.machine}/readiness`,
      `/api/machines/${ids.machine}/axes`,
      `/api/machines/${ids.machine}/rails`,
      `/api/rails/${ids.rail}/sweeps`,
      `/api/rails/${ids.rail}/bolt-downs`,
      `/api/axes/${ids.axis}/travel-trials`,
      `/api/axes/${ids.axis}/positioning-runs`,
      `/api/axes/${ids.axis}/backlash-checks`,
      `/api/machines/${ids.machine}/diagonal-checks`,
      `/api/machines/${ids.machine}/bed-grids`,
      `/api/machines/${ids.machine}/test-cuts`,
      `/api/machines/${ids.machine}/safety-walk`,
      `/api/machines/${ids.machine}/approvals`,
      `/api/machines/${ids.machine}/history`,
      '/api/target-sets',
    ];
    for (const path of lists) {
      const res = await v.get(path);
      expect({ path, status: res.status }).toEqual({ path, status: 200 });
    }
    expect((await ws.as.admin.get('/api/people')).status).toBe(200);
  });
});
