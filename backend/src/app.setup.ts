import { ValidationPipe } from '@nestjs/common';
import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import fastifyCookie from '@fastify/cookie';
import fastifySession from '@fastify/session';
import fastifyStatic from '@fastify/static';
import fastifyMultipart from '@fastify/multipart';
import connectPgSimple from 'connect-pg-simple';
import expressSession from 'express-session';
import { existsSync } from 'node:fs';
import type pg from 'pg';
import type { AppConfig } from './config/config.js';
import { PG_POOL } from './database/database.tokens.js';
import { DatabaseErrorFilter } from './common/database-error.filter.js';
import { SpaFallbackFilter } from './common/spa-fallback.filter.js';
import { appFilters } from './common/app-filters.js';
import { loadEvidenceConfig } from './evidence/evidence.config.js';

const SESSION_DAYS = 14;

/** Everything main.ts and the API tests share: prefix, sessions, validation, static files, filters. */
export async function configureApp(app: NestFastifyApplication, config: AppConfig): Promise<void> {
  app.setGlobalPrefix('api');
  const PgStore = connectPgSimple(expressSession as never);
  const store = new PgStore({ pool: app.get<pg.Pool>(PG_POOL), createTableIfMissing: true, pruneSessionInterval: 60 * 15 });
  await app.register(fastifyCookie as never);
  await app.register(fastifySession as never, {
    secret: config.sessionSecret,
    cookieName: 'railwright.sid',
    saveUninitialized: false,
    store,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.secureCookies,
      path: '/',
      maxAge: SESSION_DAYS * 24 * 3600 * 1000,
    },
  });
  // Evidence uploads: one file a request, streamed; the size limit comes from EVIDENCE_MAX_BYTES.
  await app.register(fastifyMultipart as never, { limits: { fileSize: loadEvidenceConfig().maxBytes, files: 1, fields: 10, fieldSize: 4096, parts: 12 } });
  app.useGlobalPipes(
    new ValidationPipe({ whitelist: true, forbidNonWhitelisted: true, transform: true, stopAtFirstError: false }),
  );
  const dist = config.frontendDist && existsSync(config.frontendDist) ? config.frontendDist : null;
  if (dist) {
    await app.register(fastifyStatic as never, { root: dist, prefix: '/', index: false, wildcard: true, maxAge: '1h' });
  }
  // Nest tries the last registered filter first: the catch-all goes first, the page fallback last.
  app.useGlobalFilters(new DatabaseErrorFilter(), ...appFilters(), new SpaFallbackFilter(dist));
}
