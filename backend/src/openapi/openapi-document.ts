import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule, type OpenAPIObject } from '@nestjs/swagger';
import pluginMetadata from './plugin-metadata.js';

let metadataLoaded: Promise<void> | null = null;

/**
 * The OpenAPI 3 description of every route the application registers, built from the controllers,
 * the DTOs and the response classes (their types, validation limits and doc comments, read ahead
 * of time into plugin-metadata.ts by tools/openapi/generate-metadata.mjs).
 */
export async function buildOpenApiDocument(app: INestApplication): Promise<OpenAPIObject> {
  metadataLoaded ??= SwaggerModule.loadPluginMetadata(pluginMetadata);
  await metadataLoaded;
  const config = new DocumentBuilder()
    .setTitle('Railwright API')
    .setDescription(DESCRIPTION)
    .setVersion('1')
    .build();
  return SwaggerModule.createDocument(app, config, {
    operationIdFactory: (controllerKey, methodKey) => `${controllerKey.replace(/Controller$/, '')}_${methodKey}`,
  });
}

/** The document as committed in backend/openapi.json: stable key order, two-space indent. */
export function serializeOpenApiDocument(document: OpenAPIObject): string {
  return JSON.stringify(document, null, 2) + '\n';
}

const DESCRIPTION = [
  'The commissioning and calibration log of CNC gantry machines: machines, rails, bolt-downs,',
  'frame checks, drives, safety walks, evidence and approvals.',
  '',
  'Every route but sign-in, password links, health and the public verification of an approval',
  'needs a session (the cookie set by `POST /api/auth/login`).',
  '',
  'Units: lengths are millimetres inside, but every request and record names two unit families,',
  '`lengthUnit` (positions, moves, lengths, lead, travel; feed rates per minute) and `readingUnit`',
  '(indicator readings, deviations, heights), each one of mm, um, in, thou (1 in = 25.4 mm exactly).',
  'A field whose name ends in `Mm` is in millimetres whatever the record\'s units.',
].join('\n');
