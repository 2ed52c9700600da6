import { NestFactory } from '@nestjs/core';
import { FastifyAdapter, type NestFastifyApplication } from '@nestjs/platform-fastify';
import { AppModule } from './app.module.js';
import { configureApp } from './app.setup.js';
import type { AppConfig } from './config/config.js';

// Large enough for 200 000 stations as JSON; the engine refuses more with a clear 400.
const BODY_LIMIT_BYTES = 16 * 1024 * 1024;

export async function createApp(config: AppConfig): Promise<NestFastifyApplication> {
  const app = await NestFactory.create<NestFastifyApplication>(
    AppModule,
    new FastifyAdapter({ bodyLimit: BODY_LIMIT_BYTES, trustProxy: false }),
    { logger: process.env.JEST_WORKER_ID ? ['error', 'warn'] : ['error', 'warn', 'log'] },
  );
  await configureApp(app, config);
  return app;
}
