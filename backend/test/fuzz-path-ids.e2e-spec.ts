import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { RequestMethod } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants.js';
import { ModulesContainer } from '@nestjs/core';
import { randomUUID } from 'node:crypto';
import { createTestApp, createTestWorkshop, type Agent, type TestWorkshop } from './helpers/test-app.js';

/**
 * Every route with an id in its path (deletes included), read from the controllers themselves so a
 * new route is covered the day it is added, called with ids that are not ids: never a 5xx, and
 * afterwards the lists still load. Bodies are fuzzed in fuzz-write-routes.e2e-spec.ts.
 */
const NOT_IDS = [
  'not-a-uuid',
  randomUUID(), // well formed, but nothing has it
  '00000000-0000-0000-0000-000000000000',
  'ffffffff-ffff-ffff-ffff-ffffffffffff',
  '1e308',
  '-1',
  "' or 1=1 --",
  '%00',
  '..%2F..%2Fetc%2Fpasswd',
  'x'.repeat(2000),
  '%F0%9F%94%A9', // 🔩
  '%E2%80%AE', // right-to-left override
];

interface ParamRoute {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: string;
}

const VERBS: Partial<Record<RequestMethod, ParamRoute['method']>> = {
  [RequestMethod.GET]: 'get',
  [RequestMethod.POST]: 'post',
  [RequestMethod.PUT]: 'put',
  [RequestMethod.PATCH]: 'patch',
  [RequestMethod.DELETE]: 'delete',
};

const join = (...parts: string[]) =>
  '/' +
  parts
    .map((p) => p.replace(/^\/+|\/+$/g, ''))
    .filter(Boolean)
    .join('/');

/** The routes of every controller with at least one path parameter. */
function routesWithIds(app: NestFastifyApplication): ParamRoute[] {
  const routes: ParamRoute[] = [];
  for (const module of app.get(ModulesContainer).values()) {
    for (const wrapper of module.controllers.values()) {
      const controller = wrapper.metatype as (new (...args: never[]) => unknown) | null;
      if (!controller) continue;
      const base = [Reflect.getMetadata(PATH_METADATA, controller) as string | string[]].flat()[0] ?? '';
      const proto = controller.prototype as Record<string, unknown>;
      for (const name of Object.getOwnPropertyNames(proto)) {
        const handler = proto[name];
        if (name === 'constructor' || typeof handler !== 'function') continue;
        const sub = Reflect.getMetadata(PATH_METADATA, handler) as string | string[] | undefined;
        const verb = VERBS[Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod];
        if (sub === undefined || !verb) continue;
        for (const p of [sub].flat()) {
          const path = join('api', base, p);
          if (path.includes(':')) routes.push({ method: verb, path });
        }
      }
    }
  }
  return routes;
}

describe('fuzz: ids in paths', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let routes: ParamRoute[] = [];

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Path fuzz');
    routes = routesWithIds(app);
  });
  afterAll(() => app.close());

  it('finds the routes that take ids, deletes among them', () => {
    expect(routes.length).toBeGreaterThan(40);
    expect(routes.filter((r) => r.method === 'delete').length).toBeGreaterThan(3);
    expect(routes).toContainEqual({ method: 'get', path: '/api/machines/:id' });
  });

  it.each(['owner', 'admin', 'viewer'] as const)(
    'no id that is not an id gets a 5xx, as %s',
    async (role) => {
      const agent: Agent = ws.as[role];
      const failures: string[] = [];
      for (const route of routes) {
        for (const bad of NOT_IDS) {
          const url = route.path.replace(/:[A-Za-z]+/g, bad);
          const req = agent[route.method](url);
          const res =
            route.method === 'get' || route.method === 'delete'
              ? await req
              : await req.set('Content-Type', 'application/json').send('{}');
          if (res.status >= 500)
            failures.push(
              `${route.method.toUpperCase()} ${url.slice(0, 120)} → ${res.status} ${JSON.stringify(res.body).slice(0, 200)}`,
            );
        }
      }
      expect(failures).toEqual([]);
    },
    180_000,
  );

  it('afterwards the lists still load', async () => {
    for (const path of ['/api/machines', '/api/target-sets', '/api/readiness']) {
      const res = await ws.as.viewer.get(path);
      expect({ path, status: res.status < 500 }).toEqual({ path, status: true });
    }
    expect((await ws.as.viewer.get('/api/machines')).status).toBe(200);
    expect((await ws.as.admin.get('/api/people')).status).toBe(200);
  });
});
