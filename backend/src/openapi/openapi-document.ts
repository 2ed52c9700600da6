import type { INestApplication } from '@nestjs/common';
import { ParseUUIDPipe } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA, ROUTE_ARGS_METADATA } from '@nestjs/common/constants.js';
import type { NestContainer } from '@nestjs/core';
import {
  DECORATORS,
  DocumentBuilder,
  SwaggerModule,
  type OpenAPIObject,
  type OperationObject,
  type ParameterObject,
  type ResponseObject,
  type SchemaObject,
} from '@nestjs/swagger';
import { IS_PUBLIC, ROLES_KEY } from '../auth/decorators.js';
import {
  CONFLICTS_KEY,
  ERROR_SCHEMAS,
  errorResponses,
  UNPROCESSABLE_KEY,
  type ConflictCause,
  type RouteFacts,
} from './error-responses.js';
import pluginMetadata from './plugin-metadata.js';
import { RESPONSE_SCHEMAS } from './response-schemas.js';
import { describeNamedUnits } from './units.js';

let metadataLoaded: Promise<void> | null = null;

/**
 * The OpenAPI 3 description of every route the application registers:
 * - requests from the controllers and DTOs (types, validation limits, doc comments), read ahead
 *   of time into plugin-metadata.ts by tools/openapi/generate-metadata.mjs;
 * - answers from each handler's return type (the mappers' response types), read by the same
 *   script into response-schemas.ts;
 * - the errors each route can answer, from its access rules (error-responses.ts).
 */
export async function buildOpenApiDocument(app: INestApplication): Promise<OpenAPIObject> {
  await loadOpenApiMetadata();
  return createOpenApiDocument(app);
}

/** Gives the DTOs and controllers what the plugin read from them (once a process). */
export function loadOpenApiMetadata(): Promise<void> {
  metadataLoaded ??= SwaggerModule.loadPluginMetadata(pluginMetadata);
  return metadataLoaded;
}

/** The document, once loadOpenApiMetadata() has run. */
export function createOpenApiDocument(app: INestApplication): OpenAPIObject {
  const config = new DocumentBuilder()
    .setTitle('Railwright API')
    .setDescription(DESCRIPTION)
    .setVersion('1')
    .addCookieAuth('railwright.sid', {
      type: 'apiKey',
      in: 'cookie',
      name: 'railwright.sid',
      description: SESSION_COOKIE,
    })
    .build();
  const document = SwaggerModule.createDocument(app, config, {
    operationIdFactory: (controllerKey, methodKey) => `${controllerKey.replace(/Controller$/, '')}_${methodKey}`,
  });
  const facts = routeFacts(app);
  addSchemas(document, RESPONSE_SCHEMAS.components);
  addSchemas(document, ERROR_SCHEMAS);
  for (const [path, item] of Object.entries(document.paths)) {
    for (const method of ['get', 'post', 'put', 'patch', 'delete'] as const) {
      const operation = item[method];
      if (!operation) continue;
      const key = handlerKey(operation);
      const route = facts.get(key);
      if (!route) throw new Error(`${method.toUpperCase()} ${path}: no handler ${key}`);
      describeAnswer(operation, key, route, `${method.toUpperCase()} ${path}`);
      for (const parameter of (operation.parameters ?? []) as ParameterObject[]) {
        if (parameter.in === 'path' && route.uuidParameters.includes(parameter.name))
          parameter.schema = { type: 'string', format: 'uuid' };
      }
      Object.assign(operation.responses, errorResponses(method, path, operation, route));
      if (!route.isPublic) operation.security = [{ 'railwright.sid': [] }];
    }
  }
  describeNamedUnits(document);
  return document;
}

/** The document as committed in backend/openapi.json: two-space indent, a final newline. */
export function serializeOpenApiDocument(document: OpenAPIObject): string {
  return JSON.stringify(document, null, 2) + '\n';
}

/** `Rails_list` (the operation id) → `RailsController.list` (the key response-schemas.ts uses). */
function handlerKey(operation: OperationObject): string {
  const [controller, method] = (operation.operationId ?? '').split('_');
  return `${controller}Controller.${method}`;
}

const TEXT_TYPES = /^(text\/|image\/svg\+xml)/;

/** Puts the handler's answer schema on its 2xx response, for each media type it declares. */
function describeAnswer(operation: OperationObject, key: string, route: RouteFacts, label: string) {
  if (!(key in RESPONSE_SCHEMAS.operations))
    throw new Error(`${label}: no answer schema for ${key}; run npm run openapi -w backend`);
  const schema = RESPONSE_SCHEMAS.operations[key];
  for (const [status, response] of Object.entries(operation.responses)) {
    if (!status.startsWith('2')) continue;
    const answer = response as ResponseObject;
    if (status === '204' || schema === null) {
      delete answer.content;
      answer.description ||= 'Done; no body.';
      continue;
    }
    // @ApiProduces on the handler names other media types (files, CSV, text); JSON otherwise.
    const mediaTypes = route.produces ?? ['application/json'];
    answer.content = Object.fromEntries(
      mediaTypes.map((type) => [
        type,
        {
          schema:
            type === 'application/json'
              ? schema
              : TEXT_TYPES.test(type)
                ? { type: 'string' }
                : { type: 'string', format: 'binary' },
        },
      ]),
    );
    answer.description ||= 'Done.';
  }
}

function addSchemas(document: OpenAPIObject, schemas: Record<string, SchemaObject>) {
  document.components ??= {};
  document.components.schemas ??= {};
  for (const [name, schema] of Object.entries(schemas)) {
    if (name in document.components.schemas) throw new Error(`Two schemas named ${name}: rename one of the types`);
    document.components.schemas[name] = schema;
  }
}

/**
 * Per handler: who may call it (the metadata the session guard reads), what it produces
 * (@ApiProduces), which path parameters must be uuids (ParseUUIDPipe) and why it can answer 409
 * (@ConflictsWhen) or 422 (@UnprocessableWhen).
 */
function routeFacts(app: INestApplication): Map<string, RouteFacts> {
  const container = (app as unknown as { container: NestContainer }).container;
  const facts = new Map<string, RouteFacts>();
  for (const module of container.getModules().values()) {
    for (const wrapper of module.controllers.values()) {
      const controller = wrapper.metatype as (new (...args: never[]) => object) | null;
      if (!controller) continue;
      const proto = controller.prototype as Record<string, unknown>;
      for (const name of Object.getOwnPropertyNames(proto)) {
        const handler = proto[name];
        if (typeof handler !== 'function' || Reflect.getMetadata(METHOD_METADATA, handler) === undefined) continue;
        if (Reflect.getMetadata(PATH_METADATA, handler) === undefined) continue;
        const isPublic = Boolean(Reflect.getMetadata(IS_PUBLIC, handler) ?? Reflect.getMetadata(IS_PUBLIC, controller));
        const roles = (Reflect.getMetadata(ROLES_KEY, handler) ?? Reflect.getMetadata(ROLES_KEY, controller)) as
          string[] | undefined;
        const produces = (Reflect.getMetadata(DECORATORS.API_PRODUCES, handler) as string[] | undefined) ?? null;
        const conflicts = (Reflect.getMetadata(CONFLICTS_KEY, handler) as ConflictCause[] | undefined) ?? [];
        const unprocessable = (Reflect.getMetadata(UNPROCESSABLE_KEY, handler) as string[] | undefined) ?? [];
        const args = (Reflect.getMetadata(ROUTE_ARGS_METADATA, controller, name) ?? {}) as Record<
          string,
          { data?: unknown; pipes?: unknown[] }
        >;
        const uuidParameters = Object.entries(args)
          .filter(
            ([kind, arg]) =>
              kind.startsWith('5:') &&
              typeof arg.data === 'string' &&
              arg.pipes?.some((p) => p === ParseUUIDPipe || p instanceof ParseUUIDPipe),
          )
          .map(([, arg]) => arg.data as string);
        facts.set(`${controller.name}.${name}`, {
          isPublic,
          roles: roles ?? null,
          produces,
          uuidParameters,
          conflicts,
          unprocessable,
        });
      }
    }
  }
  return facts;
}

const SESSION_COOKIE =
  'The session cookie set by POST /api/auth/login (named __Host-railwright.sid when the server is reached over https).';

const DESCRIPTION = [
  'The commissioning and calibration log of CNC gantry machines: machines, rails, bolt-downs,',
  'frame checks, drives, safety walks, evidence and approvals.',
  '',
  'Every route but sign-in, password links, health and the public verification of an approval',
  'needs a session (the cookie set by `POST /api/auth/login`); roles limit who may change records.',
  'A command (any request but GET) may carry an `Idempotency-Key` header: a repeat gets the first answer.',
  '',
  '**Units.** Lengths are millimetres inside, but every request and record names two unit families,',
  '`lengthUnit` (positions, geometry, commanded and measured moves, lead, pitch, diameters, lengths and',
  'travel; feed rates in lengthUnit per minute) and `readingUnit` (indicator readings, deviations and',
  'heights), each one of `mm`, `um`, `in`, `thou` (1 in = 25.4 mm exactly), both mm when absent.',
  "A number whose name ends in `Mm` is in millimetres whatever the record's units (`MmPerM`: mm per metre,",
  "`MmPerMin`: mm per minute); the numbers beside it without the suffix are in the record's unit family.",
  "Each field's description names its unit.",
].join('\n');
