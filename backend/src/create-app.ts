import { NestFactory } from '@nestjs/core';
import { FastifyAdapter, type NestFastifyApplication } from '@nestjs/platform-fastify';
import { AppModule } from './app.module.js';
import { configureApp } from './app.setup.js';
import { loadConfig } from './config/config.js';
import { DEFAULT_BODY_LIMIT_BYTES } from './common/request-guards.js';

/** The application for an environment (the process's own unless a test gives another). */
export async function createApp(env: NodeJS.ProcessEnv = process.env): Promise<NestFastifyApplication> {
  const config = loadConfig(env);
  const app = await NestFactory.create<NestFastifyApplication>(
    AppModule.for(env),
    // Each route's own limit is set in common/request-guards.ts; this is the default.
    new FastifyAdapter({ bodyLimit: DEFAULT_BODY_LIMIT_BYTES, trustProxy: config.trustProxy as boolean }),
    { logger: process.env.JEST_WORKER_ID ? ['error', 'warn'] : ['error', 'warn', 'log'] },
  );
  await configureApp(app, config);
  return app;
}
