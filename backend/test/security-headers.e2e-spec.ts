import { SessionChangesListener } from '../src/database/session-changes.listener.js';
import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import request from 'supertest';
import { mkdtempSync, mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { loadConfig } from '../src/config/config.js';
import { createApp } from '../src/create-app.js';
import pg from 'pg';
import { PG_POOL } from '../src/database/database.tokens.js';
import { createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';

describe('security headers and caching', () => {
  let api: NestFastifyApplication;
  let ws: TestWorkshop;
  let site: NestFastifyApplication;

  beforeAll(async () => {
    api = await createTestApp();
    ws = await createTestWorkshop(api, 'Headers');
    // A small built front end, so the static rules can be seen without a real build.
    const dist = mkdtempSync(path.join(tmpdir(), 'railwright-dist-'));
    mkdirSync(path.join(dist, 'assets'));
    writeFileSync(
      path.join(dist, 'index.html'),
      '<!doctype html><title>Railwright</title><div id="root"></div><script type="module" src="/assets/index-abc123.js"></script>',
    );
    writeFileSync(path.join(dist, 'assets', 'index-abc123.js'), 'console.log(1)');
    writeFileSync(path.join(dist, 'railwright.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
    site = await createApp({ ...process.env, FRONTEND_DIST: dist });
    await site.init();
    await site.getHttpAdapter().getInstance().ready();
  });
  afterAll(async () => {
    await api.close();
    await site.close();
  });

  it('every answer carries a strict CSP, nosniff, no framing and a same-origin Referrer-Policy', async () => {
    for (const res of [
      await ws.as.viewer.get('/api/machines'),
      await request(site.getHttpServer()).get('/').set('Accept', 'text/html'),
    ]) {
      const csp = res.headers['content-security-policy'];
      expect(csp).toMatch(/default-src 'self'/);
      expect(csp).toMatch(/script-src 'self'(;|$)/); // no inline script
      expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
      expect(csp).toMatch(/frame-ancestors 'none'/);
      expect(csp).toMatch(/base-uri 'self'/);
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      expect(res.headers['x-frame-options']).toBe('DENY');
      expect(res.headers['referrer-policy']).toBe('same-origin');
    }
  });

  it('API answers are never cached, errors included', async () => {
    expect((await ws.as.viewer.get('/api/machines')).headers['cache-control']).toBe('no-store');
    expect((await request(api.getHttpServer()).get('/api/auth/me')).headers['cache-control']).toBe('no-store');
    expect((await request(api.getHttpServer()).get('/api/health')).headers['cache-control']).toBe('no-store');
  });

  it('hashed assets are cached for a year as immutable; index.html is revalidated', async () => {
    const server = request(site.getHttpServer());
    const asset = await server.get('/assets/index-abc123.js');
    expect(asset.status).toBe(200);
    expect(asset.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    const root = await server.get('/').set('Accept', 'text/html');
    expect(root.headers['cache-control']).toBe('no-cache');
    const deep = await server.get('/machines/123').set('Accept', 'text/html');
    expect(deep.status).toBe(200);
    expect(deep.headers['cache-control']).toBe('no-cache');
  });

  it('GET / opens the app (it answered 403 when the folder index was refused)', async () => {
    const root = await request(site.getHttpServer()).get('/').set('Accept', 'text/html');
    expect(root.status).toBe(200);
    expect(root.headers['content-type']).toMatch(/text\/html/);
    expect(root.text).toContain('<div id="root">');
  });

  it('sessions end after 30 days however active, and the cookie is Secure when the public URL is https', async () => {
    const w = await createTestWorkshop(api, 'Lifetime');
    const agent = w.as.viewer;
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    const pool = api.get<pg.Pool>(PG_POOL);
    // Signed in 31 days ago and active ever since: the idle expiry alone would keep it.
    const updated = await pool.query(
      `update session set sess = jsonb_set(sess::jsonb, '{createdAt}', to_jsonb((extract(epoch from now()) * 1000 - 31 * 86400000::bigint)::bigint))::json
       where sess->>'userId' = $1`,
      [w.userIds.viewer],
    );
    expect(updated.rowCount).toBe(1);
    // Changed by hand, as another server would: counts once the change's announcement is heard.
    await api.get(SessionChangesListener).caughtUp();
    expect((await agent.get('/api/auth/me')).status).toBe(401);

    expect(loadConfig({ ...process.env, PUBLIC_URL: 'https://railwright.example.org' }).secureCookies).toBe(true);
    expect(
      loadConfig({ ...process.env, PUBLIC_URL: 'http://127.0.0.1:3000', SECURE_COOKIES: undefined }).secureCookies,
    ).toBe(false);
  });

  it('served over https, the session cookie is named with the __Host- prefix: Secure, path /, no domain', async () => {
    const w = await createTestWorkshop(api, 'Host cookie');
    // Behind a TLS-terminating proxy, as an https installation runs: the proxy says the request was https.
    const https = await createApp({
      ...process.env,
      FRONTEND_DIST: '',
      PUBLIC_URL: 'https://railwright.example.org',
      TRUST_PROXY: 'true',
    });
    await https.init();
    await https.getHttpAdapter().getInstance().ready();
    try {
      const res = await request(https.getHttpServer())
        .post('/api/auth/login')
        .set('x-forwarded-proto', 'https')
        .send({ email: w.emails.viewer, password: TEST_PASSWORD });
      expect(res.status).toBe(200);
      const cookie = ([] as string[])
        .concat(res.headers['set-cookie'] ?? [])
        .find((c) => c.includes('railwright.sid='));
      expect(cookie).toMatch(/^__Host-railwright\.sid=/);
      expect(cookie).toMatch(/; Secure/);
      expect(cookie).toMatch(/; Path=\/(;|$)/);
      expect(cookie).not.toMatch(/Domain=/i);
    } finally {
      await https.close();
    }
    // Over plain http (a workshop's own network) a __Host- cookie would be refused by browsers.
    expect(
      loadConfig({ ...process.env, PUBLIC_URL: 'http://127.0.0.1:3000', SECURE_COOKIES: undefined }).sessionCookieName,
    ).toBe('railwright.sid');
  });

  it('production refuses to start without a session secret, with a clear message', () => {
    expect(() => loadConfig({ DATABASE_URL: process.env.DATABASE_URL, NODE_ENV: 'production' })).toThrow(
      /SESSION_SECRET is required when NODE_ENV=production/,
    );
    expect(() =>
      loadConfig({ DATABASE_URL: process.env.DATABASE_URL, NODE_ENV: 'production', SESSION_SECRET: 'short' }),
    ).toThrow(/at least 32 characters/);
  });
});
