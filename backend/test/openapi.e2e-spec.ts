import 'reflect-metadata';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { isDeepStrictEqual } from 'node:util';
import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { METHOD_METADATA, PATH_METADATA, ROUTE_ARGS_METADATA } from '@nestjs/common/constants.js';
import { RequestMethod } from '@nestjs/common';
import type { NestContainer } from '@nestjs/core';
import type { OpenAPIObject, OperationObject, ReferenceObject, SchemaObject } from '@nestjs/swagger';
import { randomUUID } from 'node:crypto';
import { getMetadataStorage } from 'class-validator';
import { describeApiWithoutServer } from '../src/openapi/write-document.js';
import { serializeOpenApiDocument } from '../src/openapi/openapi-document.js';
import { CONFLICT_CAUSES, KEY_CONFLICT, KEY_UNPROCESSABLE } from '../src/openapi/error-responses.js';
import { numbersWithoutUnit } from '../src/openapi/unit-rule.js';
import { LENGTH_UNITS } from '../src/engine/units.js';
import { anonymous, createTestApp, createTestWorkshop } from './helpers/test-app.js';
import { lockAsApproved } from './support/stand-in-approval.js';

const COMMITTED = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../openapi.json');
const BODY_ARGUMENT = '3:'; // RouteParamtypes.BODY
const METHODS = ['get', 'post', 'put', 'patch', 'delete'] as const;

interface Handler {
  method: (typeof METHODS)[number];
  path: string;
  key: string;
  body: (new () => object) | null;
}

/** Every handler Nest registers, read from the same metadata its router reads. */
function registeredHandlers(app: NestFastifyApplication): Handler[] {
  const container = (app as unknown as { container: NestContainer }).container;
  const out: Handler[] = [];
  for (const module of container.getModules().values()) {
    for (const wrapper of module.controllers.values()) {
      const controller = wrapper.metatype as (new (...args: never[]) => object) | null;
      if (!controller) continue;
      const base = String(Reflect.getMetadata(PATH_METADATA, controller) ?? '');
      const proto = controller.prototype as Record<string, unknown>;
      for (const name of Object.getOwnPropertyNames(proto)) {
        const fn = proto[name];
        if (typeof fn !== 'function' || name === 'constructor') continue;
        const requestMethod = Reflect.getMetadata(METHOD_METADATA, fn) as RequestMethod | undefined;
        const routePath = Reflect.getMetadata(PATH_METADATA, fn) as string | undefined;
        if (requestMethod === undefined || routePath === undefined) continue;
        const full =
          '/' +
          ['api', base, routePath]
            .map((p) => p.replace(/^\/+|\/+$/g, ''))
            .filter(Boolean)
            .join('/');
        const args = (Reflect.getMetadata(ROUTE_ARGS_METADATA, controller, name) ?? {}) as Record<
          string,
          { index: number }
        >;
        const bodyKey = Object.keys(args).find((k) => k.startsWith(BODY_ARGUMENT));
        const types = (Reflect.getMetadata('design:paramtypes', controller.prototype, name) ??
          []) as (new () => object)[];
        out.push({
          method: RequestMethod[requestMethod].toLowerCase() as Handler['method'],
          path: full.replace(/:([A-Za-z0-9_]+)/g, '{$1}'),
          key: `${controller.name}.${name}`,
          body: bodyKey ? types[args[bodyKey].index] : null,
        });
      }
    }
  }
  return out;
}

function resolve(document: OpenAPIObject, schema: SchemaObject | ReferenceObject): SchemaObject {
  if ('$ref' in schema) {
    const name = schema.$ref.replace('#/components/schemas/', '');
    const found = document.components?.schemas?.[name];
    if (!found) throw new Error(`missing schema ${schema.$ref}`);
    return resolve(document, found);
  }
  return schema;
}

/** Every $ref anywhere in a value. */
function refsIn(value: unknown, out = new Set<string>()): Set<string> {
  if (Array.isArray(value)) value.forEach((v) => refsIn(v, out));
  else if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      if (k === '$ref' && typeof v === 'string') out.add(v);
      else refsIn(v, out);
    }
  }
  return out;
}

describe('API description (OpenAPI 3)', () => {
  let app: NestFastifyApplication;
  let served: OpenAPIObject;
  let handlers: Handler[];

  beforeAll(async () => {
    app = await createTestApp();
    handlers = registeredHandlers(app);
    const res = await anonymous(app).get('/api/openapi.json');
    expect(res.status).toBe(200);
    served = res.body as OpenAPIObject;
  });
  afterAll(async () => {
    await app.close();
  });

  it('is served without a session, as JSON, and is OpenAPI 3', async () => {
    const res = await anonymous(app).get('/api/openapi.json');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    expect(served.openapi).toMatch(/^3\./);
    expect(served.info.title).toBe('Railwright API');
  });

  it('lists every route the server registers, with its method, and nothing else', () => {
    expect(handlers.length).toBeGreaterThan(100);
    const fastify = app.getHttpAdapter().getInstance();
    for (const h of handlers) {
      // The path as the router knows it (the cross-check that the metadata read above is right).
      expect({
        route: `${h.method} ${h.path}`,
        registered: fastify.hasRoute({
          method: h.method.toUpperCase() as 'GET',
          url: h.path.replace(/\{([^}]+)\}/g, ':$1'),
        }),
      }).toEqual({ route: `${h.method} ${h.path}`, registered: true });
      expect({ route: `${h.method} ${h.path}`, described: Boolean(served.paths[h.path]?.[h.method]) }).toEqual({
        route: `${h.method} ${h.path}`,
        described: true,
      });
    }
    const described = Object.entries(served.paths).flatMap(([p, item]) =>
      METHODS.filter((m) => item[m]).map((m) => `${m} ${p}`),
    );
    expect(described.sort()).toEqual(handlers.map((h) => `${h.method} ${h.path}`).sort());
  });

  it('gives every 2xx answer a schema (JSON answers a typed one) and every 204 none', () => {
    for (const [p, item] of Object.entries(served.paths)) {
      for (const m of METHODS) {
        const op = item[m] as OperationObject | undefined;
        if (!op) continue;
        const ok = Object.entries(op.responses).filter(([status]) => status.startsWith('2'));
        // One success, or a new record (201) and the same entry sent again (200), each described.
        const statuses = ok.map(([status]) => status).sort();
        expect({ route: `${m} ${p}`, oneOrNewAndRepeated: ok.length === 1 || statuses.join() === '200,201' }).toEqual({
          route: `${m} ${p}`,
          oneOrNewAndRepeated: true,
        });
        for (const [status, response] of ok) {
          const content = response && 'content' in response ? response.content : undefined;
          if (status === '204') {
            expect({ route: `${m} ${p}`, content }).toEqual({ route: `${m} ${p}`, content: undefined });
            continue;
          }
          expect({ route: `${m} ${p}`, hasContent: Boolean(content && Object.keys(content).length) }).toEqual({
            route: `${m} ${p}`,
            hasContent: true,
          });
          for (const [type, media] of Object.entries(content ?? {})) {
            const schema = resolve(served, media.schema!);
            const typed = Boolean(schema.type || schema.oneOf || schema.allOf || schema.nullable);
            expect({ route: `${m} ${p}`, type, typed }).toEqual({ route: `${m} ${p}`, type, typed: true });
            if (type === 'application/json' && schema.type === 'object') {
              expect({
                route: `${m} ${p}`,
                described: Object.keys(schema.properties ?? {}).length > 0 || Boolean(schema.additionalProperties),
              }).toEqual({ route: `${m} ${p}`, described: true });
            }
          }
        }
      }
    }
  });

  it('resolves every schema reference', () => {
    const names = new Set(Object.keys(served.components?.schemas ?? {}).map((n) => `#/components/schemas/${n}`));
    for (const ref of refsIn(served)) expect({ ref, found: names.has(ref) }).toEqual({ ref, found: true });
  });

  it('describes each request body with its DTO: the same fields, the same required ones', () => {
    const storage = getMetadataStorage();
    let checked = 0;
    for (const h of handlers) {
      if (!h.body || h.body === Object) continue;
      const op = served.paths[h.path][h.method] as OperationObject;
      const body =
        op.requestBody && 'content' in op.requestBody ? op.requestBody.content['application/json']?.schema : undefined;
      expect({ route: h.key, body: Boolean(body) }).toEqual({ route: h.key, body: true });
      const schema = resolve(served, body!);
      const rules = storage.getTargetValidationMetadatas(h.body, '', true, false);
      const fields = new Map<string, { optional: boolean; refused: boolean }>();
      for (const rule of rules) {
        const f = fields.get(rule.propertyName) ?? { optional: false, refused: false };
        if (rule.type === 'conditionalValidation') f.optional = true;
        // A field refused whenever it is sent (the old single `unit`) is left out of the description.
        if (rule.name === 'isEmpty' || (rule.name === 'equals' && rule.constraints?.[0] === undefined))
          f.refused = true;
        fields.set(rule.propertyName, f);
      }
      const expectedFields = [...fields]
        .filter(([, f]) => !f.refused)
        .map(([n]) => n)
        .sort();
      const expectedRequired = [...fields]
        .filter(([, f]) => !f.refused && !f.optional)
        .map(([n]) => n)
        .sort();
      expect({ route: h.key, dto: h.body.name, fields: Object.keys(schema.properties ?? {}).sort() }).toEqual({
        route: h.key,
        dto: h.body.name,
        fields: expectedFields,
      });
      expect({ route: h.key, dto: h.body.name, required: [...(schema.required ?? [])].sort() }).toEqual({
        route: h.key,
        dto: h.body.name,
        required: expectedRequired,
      });
      checked++;
    }
    expect(checked).toBeGreaterThan(30);
  });

  it('describes the DTOs nested in request bodies with all their fields', () => {
    // The validation rules of every class, nested ones (a sweep's stations, a pattern's holes) included.
    const byClass = (
      getMetadataStorage() as unknown as {
        validationMetadatas: Map<
          abstract new (...args: never[]) => unknown,
          { propertyName: string; name?: string; constraints?: unknown[] }[]
        >;
      }
    ).validationMetadatas;
    const schemas = served.components?.schemas ?? {};
    let checked = 0;
    for (const [target, rules] of byClass) {
      const schema = schemas[target.name] as SchemaObject | undefined;
      if (!schema || !target.name.endsWith('Dto')) continue;
      // A field refused whenever it is sent (the old single `unit`) is left out of the description.
      const refused = new Set(
        rules
          .filter((r) => r.name === 'isEmpty' || (r.name === 'equals' && r.constraints?.[0] === undefined))
          .map((r) => r.propertyName),
      );
      const fields = [...new Set(rules.map((r) => r.propertyName))].filter((f) => !refused.has(f)).sort();
      const described = Object.keys(schema.properties ?? {});
      expect({ dto: target.name, missing: fields.filter((f) => !described.includes(f)) }).toEqual({
        dto: target.name,
        missing: [],
      });
      checked++;
    }
    expect(schemas.StationDto).toBeDefined();
    expect(checked).toBeGreaterThan(40);
  });

  it('documents the refusals: 400 with the validation body, 401 for signed-in routes, 403 where roles are limited, 409 for commands', () => {
    const validation = resolve(served, { $ref: '#/components/schemas/ValidationErrorResponse' });
    expect(validation.required).toEqual(['statusCode', 'message', 'error']);
    expect(validation.properties?.message).toEqual(
      expect.objectContaining({ type: 'array', items: { type: 'string' } }),
    );
    const create = served.paths['/api/machines'].post as OperationObject;
    expect(Object.keys(create.responses).sort()).toEqual(['201', '400', '401', '403', '409', '422']);
    const health = served.paths['/api/health'].get as OperationObject;
    expect(Object.keys(health.responses)).not.toContain('401');
    const people = served.paths['/api/people'].get as OperationObject;
    expect(people.responses['403']).toBeDefined();
  });

  it('says the unit of every number, in requests, answers, nested shapes and parameters, or that it has none', () => {
    // The rule (src/openapi/unit-rule.ts) wants a unit itself ("mm", "`readingUnit`", "°C", "rpm", …) or
    // "count", "index from 0/1", "ratio", "no unit": the word "unit" or "number of" alone does not pass.
    expect(numbersWithoutUnit(served)).toEqual([]);
  });

  it('gives the two unit families one named list each, which every unit field of requests and answers refers to', () => {
    const schemas = served.components?.schemas ?? {};
    for (const name of ['LengthUnit', 'ReadingUnit']) {
      expect(schemas[name]).toEqual(expect.objectContaining({ type: 'string', enum: [...LENGTH_UNITS] }));
    }
    const inline: string[] = [];
    let referring = 0;
    const walk = (value: unknown, where: string): void => {
      if (Array.isArray(value)) return value.forEach((v) => walk(v, where));
      if (!value || typeof value !== 'object') return;
      const props = (value as SchemaObject).properties;
      for (const [name, prop] of Object.entries(props ?? {})) {
        if (name !== 'lengthUnit' && name !== 'readingUnit') continue;
        const text = JSON.stringify(prop);
        if (text.includes(`#/components/schemas/${name === 'lengthUnit' ? 'LengthUnit' : 'ReadingUnit'}`)) referring++;
        else if ((prop as SchemaObject).enum) inline.push(`${where} ${name}`);
      }
      for (const [key, v] of Object.entries(value)) walk(v, `${where}/${key}`);
    };
    walk(served.components?.schemas, 'components');
    walk(served.paths, 'paths');
    expect(inline).toEqual([]);
    expect(referring).toBeGreaterThan(60);
  });

  it('names the unit of every number whose name carries one', () => {
    let seen = 0;
    for (const [name, schema] of Object.entries(served.components?.schemas ?? {})) {
      for (const [prop, value] of Object.entries((schema as SchemaObject).properties ?? {})) {
        if (!/Mm$/.test(prop)) continue;
        seen++;
        const text = (value as SchemaObject).description ?? '';
        expect({ field: `${name}.${prop}`, saysMm: /\bmm\b|millimetres/.test(text) }).toEqual({
          field: `${name}.${prop}`,
          saysMm: true,
        });
      }
    }
    expect(seen).toBeGreaterThan(10);
  });

  describe('answer codes held to what the server answers', () => {
    const responsesOf = (route: string, method: (typeof METHODS)[number]) =>
      (served.paths[route][method] as OperationObject).responses as Record<string, { description: string }>;

    it('a sweep sent again with its id answers 200 with the same sweep, and both 201 and 200 are described', async () => {
      const ws = await createTestWorkshop(app, 'Answer codes');
      const machine = await ws.as.builder
        .post('/api/machines')
        .send({ name: 'Codes table', kind: 'plasma', workArea: { x: 3000, y: 1500 } });
      const rail = await ws.as.builder
        .post(`/api/machines/${machine.body.id}/rails`)
        .send({ label: 'Y1', axis: 'Y1', length: 1000, profileSize: 20, holePitch: 60, firstHole: 20 });
      const sweep = {
        id: randomUUID(),
        phase: 'as-found',
        stations: [0, 250, 500, 750].map((position, i) => ({ position, reading: [0, 0.01, 0.015, 0][i] })),
      };
      const first = await ws.as.builder.post(`/api/rails/${rail.body.id}/sweeps`).send(sweep);
      const again = await ws.as.builder.post(`/api/rails/${rail.body.id}/sweeps`).send(sweep);
      expect([first.status, again.status]).toEqual([201, 200]);
      expect(again.body.id).toBe(first.body.id);
      for (const route of ['/api/rails/{id}/sweeps', '/api/bolt-downs/{id}/final-sweep']) {
        const answers = responsesOf(route, 'post');
        expect(answers['201'].description).toMatch(/recorded/);
        expect(answers['200'].description).toMatch(/`id` was recorded before/);
      }

      // A locked sweep (an approval stands on it) is refused with 409, and 409 is described with that reason.
      await lockAsApproved(app, [{ recordType: 'rail-sweep', recordId: first.body.id }]);
      const removed = await ws.as.builder.delete(`/api/sweeps/${first.body.id}`);
      expect(removed.status).toBe(409);
      expect(removed.body.message).toMatch(/approved commissioning record/);
      const edited = await ws.as.builder.patch(`/api/sweeps/${first.body.id}`).send({ notes: 'later' });
      expect(edited.status).toBe(409);
      for (const [route, method] of [
        ['/api/sweeps/{id}', 'delete'],
        ['/api/sweeps/{id}', 'patch'],
      ] as const) {
        expect(responsesOf(route, method)['409'].description).toContain(CONFLICT_CAUSES['approval-lock']);
      }
    });

    it('a calculator has no cause of its own: its 409 is only the Idempotency-Key’s, which it really answers', async () => {
      const ws = await createTestWorkshop(app, 'Calculator codes');
      const key = randomUUID();
      const fit = { positions: [0, 100, 200, 300], readings: [0, 0.01, 0.005, 0] };
      expect((await ws.as.owner.post('/api/calc/straightness').set('Idempotency-Key', key).send(fit)).status).toBe(200);
      const theirs = await ws.as.viewer.post('/api/calc/straightness').set('Idempotency-Key', key).send(fit);
      expect(theirs.status).toBe(409);
      const described = responsesOf('/api/calc/straightness', 'post')['409'].description;
      expect(described).toContain(KEY_CONFLICT);
      for (const cause of Object.values(CONFLICT_CAUSES)) expect(described).not.toContain(cause);
    });

    it('one Idempotency-Key for two commands answers 422, described on every command with the route’s own causes', async () => {
      const ws = await createTestWorkshop(app, 'Key codes');
      const key = randomUUID();
      const fit = { positions: [0, 100, 200, 300], readings: [0, 0.01, 0.005, 0] };
      expect((await ws.as.owner.post('/api/calc/straightness').set('Idempotency-Key', key).send(fit)).status).toBe(200);
      const other = await ws.as.owner
        .post('/api/calc/parallelism')
        .set('Idempotency-Key', key)
        .send({
          positions: [0, 100, 200],
          railA: [0, 0.01, 0],
          railB: [0, 0, 0.01],
        });
      expect(other.status).toBe(422);
      expect(other.body.message).toMatch(/another command/);
      expect(responsesOf('/api/calc/parallelism', 'post')['422'].description).toContain(KEY_UNPROCESSABLE);
      const apply = responsesOf('/api/axes/{id}/travel-trials/{trialId}/apply', 'post')['422'].description;
      expect(apply).toContain('confirmFarCorrection');
      expect(apply).toContain(KEY_UNPROCESSABLE);
    });

    it('a route with no cause for 409 does not describe it: a command without a session takes no key', async () => {
      const key = randomUUID();
      const body = { email: `nobody.${key.slice(0, 8)}@test.example.com` };
      const answers = [];
      for (let i = 0; i < 2; i++)
        answers.push(
          await anonymous(app).post('/api/auth/password-reset/request').set('Idempotency-Key', key).send(body),
        );
      expect(answers.map((a) => a.status)).toEqual([202, 202]);
      expect(Object.keys(responsesOf('/api/auth/password-reset/request', 'post'))).not.toContain('409');
      expect(Object.keys(responsesOf('/api/auth/password-reset/request', 'post'))).not.toContain('422');
      // Nor does any read.
      for (const [p, item] of Object.entries(served.paths))
        if (item.get)
          expect({ route: `get ${p}`, has409: '409' in item.get.responses }).toEqual({
            route: `get ${p}`,
            has409: false,
          });
    });
  });

  it('is committed as generated: backend/openapi.json equals what the server serves and what the sources give', async () => {
    const committed = JSON.parse(readFileSync(COMMITTED, 'utf8')) as unknown;
    // Compared as values: a second document made in one process may list an object's keys in another order.
    const fromSources = JSON.parse(serializeOpenApiDocument(await describeApiWithoutServer())) as unknown;
    const stale =
      'backend/openapi.json is stale: run `npm run openapi -w backend` and commit it with frontend/src/lib/api/schema.d.ts';
    expect({ stale: isDeepStrictEqual(fromSources, committed) ? null : stale }).toEqual({ stale: null });
    expect({ stale: isDeepStrictEqual(served, committed) ? null : stale }).toEqual({ stale: null });
  });

  it('serves a reference page of its own: every script, style and icon from this origin, under the same policy', async () => {
    const res = await anonymous(app).get('/api/reference').set('Accept', 'text/html');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/html/);
    expect(res.headers['content-security-policy']).toContain("script-src 'self'");
    const html = res.text;
    const urls = [...html.matchAll(/\b(?:src|href)\s*=\s*["']([^"']+)["']/g)].map((m) => m[1]);
    expect(urls.length).toBeGreaterThanOrEqual(4);
    for (const url of urls) {
      // Same origin: no scheme, no host (a page address or a path of this server).
      expect({ url, sameOrigin: !/^([a-z]+:)?\/\//i.test(url) }).toEqual({ url, sameOrigin: true });
    }
    expect(html).not.toMatch(/<script(?![^>]*\bsrc=)[^>]*>\s*\S/); // no inline script
    for (const url of urls.filter((u) => !u.startsWith('/railwright.svg'))) {
      const asset = await anonymous(app).get(new URL(url, 'http://server/api/reference').pathname);
      expect({ url, status: asset.status }).toEqual({ url, status: 200 });
    }
    const init = await anonymous(app).get('/api/reference/swagger-ui-init.js');
    expect(init.status).toBe(200);
    expect(init.text).toContain('"validatorUrl": null');
  });
});
