import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import fastifyCompress from '@fastify/compress';
import fastifyCookie from '@fastify/cookie';
import fastifySession from '@fastify/session';
import fastifyStatic from '@fastify/static';
import fastifyMultipart from '@fastify/multipart';
import fastifyHelmet from '@fastify/helmet';
import type { FastifyInstance } from 'fastify';
import { existsSync } from 'node:fs';
import { constants as zlibConstants } from 'node:zlib';
import type pg from 'pg';
import type { AppConfig } from './config/config.js';
import { PG_POOL } from './database/database.tokens.js';
import { createSessionStore } from './database/session-store.js';
import { SessionCache } from './database/session-cache.js';
import { DatabaseErrorFilter } from './common/database-error.filter.js';
import { SpaFallbackFilter } from './common/spa-fallback.filter.js';
import { appFilters } from './common/app-filters.js';
import { AppValidationPipe } from './common/app-validation.pipe.js';
import { registerRequestGuards } from './common/request-guards.js';
import { absoluteSessionLifetime } from './common/session-lifetime.js';
import { refreshSessionsPeriodically } from './common/session-refresh.js';
import { staticCacheHeaders } from './common/static-cache.js';
import { loadEvidenceConfig } from './evidence/evidence.config.js';
import { mountApiReference } from './openapi/api-reference.js';

/** Idle lifetime: the cookie and the stored session expire this long after the last request. */
const SESSION_IDLE_DAYS = 14;
/** JSON answers smaller than this go out as they are: compressing them saves less than it costs. */
const COMPRESS_ABOVE_BYTES = 2048;
/** A session's idle expiry is pushed forward (and stored) at most this often. */
const SESSION_REFRESH_HOURS = 24;
/** Absolute lifetime: a session ends this long after sign-in, however active. */
export const SESSION_ABSOLUTE_DAYS = 30;

// Strict policy: the app's own scripts only. MUI (emotion) inserts <style> elements at run
// time, so styles also allow inline; no inline script anywhere.
const CONTENT_SECURITY_POLICY = {
  useDefaults: false,
  directives: {
    defaultSrc: ["'self'"],
    scriptSrc: ["'self'"],
    styleSrc: ["'self'", "'unsafe-inline'"],
    imgSrc: ["'self'", 'data:', 'blob:'],
    fontSrc: ["'self'", 'data:'],
    connectSrc: ["'self'"],
    baseUri: ["'self'"],
    formAction: ["'self'"],
    frameAncestors: ["'none'"],
  },
};

/** Every API route is under /api; everything else is the single-page app. */
export const API_PREFIX = 'api';

/** Everything main.ts and the API tests share: prefix, sessions, validation, static files, filters. */
export async function configureApp(app: NestFastifyApplication, config: AppConfig): Promise<void> {
  app.setGlobalPrefix(API_PREFIX);
  const fastify = app.getHttpAdapter().getInstance() as unknown as FastifyInstance;
  registerRequestGuards(fastify, {
    allowedOrigins: [config.appUrl, ...config.extraOrigins],
    uploadBodyLimit: loadEvidenceConfig().maxBytes + 1024 * 1024,
  });
  await app.register(fastifyHelmet as never, {
    contentSecurityPolicy: CONTENT_SECURITY_POLICY,
    frameguard: { action: 'deny' },
    referrerPolicy: { policy: 'same-origin' },
    crossOriginEmbedderPolicy: false,
    hsts: config.appUrl.startsWith('https://') ? { maxAge: 180 * 24 * 3600 } : false,
  });
  // API answers above a size go out compressed (brotli or gzip, as the browser asks). Static files
  // are served precompressed by @fastify/static; whatever already carries an encoding is left alone.
  // Stored photos and files go out byte for byte, with their length: photos do not shrink, and
  // a download's checksum stays checkable. (Set before compression registers, which reads it.)
  app
    .getHttpAdapter()
    .getInstance()
    .addHook('onRoute', (route) => {
      if (/^\/api\/evidence\/:[^/]+\/(content|thumbnail)$/.test(route.url))
        (route as { compress?: boolean }).compress = false;
    });
  await app.register(fastifyCompress as never, {
    global: true,
    threshold: COMPRESS_ABOVE_BYTES,
    encodings: ['br', 'gzip'],
    // Fast brotli: on a 2-core server a quality-11 pass over a large answer costs more than it saves.
    brotliOptions: { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 4 } },
  });
  const store = createSessionStore(app.get<pg.Pool>(PG_POOL), app.get(SessionCache));
  await app.register(fastifyCookie as never);
  await app.register(fastifySession as never, {
    secret: config.sessionSecret,
    cookieName: config.sessionCookieName,
    saveUninitialized: false,
    store,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.secureCookies,
      path: '/',
      maxAge: SESSION_IDLE_DAYS * 24 * 3600 * 1000,
    },
    // Not on every request: a session is stored again at most once a day (refreshSessionsPeriodically).
    rolling: false,
  });
  absoluteSessionLifetime(fastify, SESSION_ABSOLUTE_DAYS * 24 * 3600 * 1000);
  refreshSessionsPeriodically(fastify, SESSION_REFRESH_HOURS * 3600 * 1000);
  // Evidence uploads: one file a request, streamed; the size limit comes from EVIDENCE_MAX_BYTES.
  await app.register(fastifyMultipart as never, {
    limits: { fileSize: loadEvidenceConfig().maxBytes, files: 1, fields: 10, fieldSize: 4096, parts: 12 },
  });
  app.useGlobalPipes(
    new AppValidationPipe({ whitelist: true, forbidNonWhitelisted: true, transform: true, stopAtFirstError: false }),
  );
  const dist = config.frontendDist && existsSync(config.frontendDist) ? config.frontendDist : null;
  if (dist) {
    // index.html at / as well (with index: false, / was a directory listing refused with 403).
    await app.register(fastifyStatic as never, {
      root: dist,
      prefix: '/',
      index: ['index.html'],
      wildcard: true,
      cacheControl: false,
      setHeaders: staticCacheHeaders,
      // The build writes .br and .gz beside each file; the copy the browser accepts is sent as it is.
      preCompressed: true,
    });
  }
  await mountApiReference(app);
  // Nest tries the last registered filter first: the catch-all goes first, the page fallback last.
  app.useGlobalFilters(new DatabaseErrorFilter(), ...appFilters(), new SpaFallbackFilter(dist));
}
