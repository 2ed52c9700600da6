import 'reflect-metadata';
import { writeFileSync } from 'node:fs';
import type { DynamicModule } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { FastifyAdapter, type NestFastifyApplication } from '@nestjs/platform-fastify';
import { AppModule } from '../app.module.js';
import { API_PREFIX } from '../app.setup.js';
import { buildOpenApiDocument, serializeOpenApiDocument } from './openapi-document.js';

/** An environment that passes the configuration's checks; preview mode never connects to it. */
const DESCRIBE_ENV: NodeJS.ProcessEnv = { DATABASE_URL: 'postgres://describe@127.0.0.1:1/describe', FRONTEND_DIST: '' };

function appModule() {
  const withConfig = (AppModule as { for?: (env: NodeJS.ProcessEnv) => DynamicModule }).for;
  return withConfig ? withConfig.call(AppModule, DESCRIBE_ENV) : AppModule;
}

/**
 * The OpenAPI description from the module graph alone: preview mode registers the routes without
 * making any provider, so no database or configuration is needed.
 */
export async function describeApiWithoutServer() {
  const app = await NestFactory.create<NestFastifyApplication>(appModule(), new FastifyAdapter(), {
    preview: true,
    logger: ['error'],
    abortOnError: false,
  });
  try {
    app.setGlobalPrefix(API_PREFIX);
    return await buildOpenApiDocument(app);
  } finally {
    await app.close();
  }
}

/** Writes the description to `target` (backend/openapi.json; tools/openapi/write.mjs calls this). */
export async function writeOpenApiDocument(target: string): Promise<void> {
  const document = await describeApiWithoutServer();
  writeFileSync(target, serializeOpenApiDocument(document));
  console.log(`wrote ${target}: ${Object.keys(document.paths).length} paths`);
}
