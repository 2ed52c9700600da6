import 'reflect-metadata';
import { Injectable, Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import { appConfigModule, type RailwrightConfig } from './app-config.module.js';
import { loadConfig } from './config.js';

@Injectable()
class Reader {
  constructor(readonly config: ConfigService<RailwrightConfig, true>) {}
}

const GOOD = { DATABASE_URL: 'postgres://app@127.0.0.1:5432/rw', SESSION_SECRET: 'x'.repeat(40) };

async function contextFor(env: NodeJS.ProcessEnv) {
  @Module({ imports: [appConfigModule(env)], providers: [Reader] })
  class Probe {}
  return NestFactory.createApplicationContext(Probe, { logger: false, abortOnError: false });
}

describe('configuration through ConfigModule', () => {
  it('serves the checked configuration of the environment the app was started with, the same object loadConfig gives', async () => {
    const env = { ...GOOD, PUBLIC_URL: 'https://railwright.example.org', PORT: '3400' };
    const app = await contextFor(env);
    const config = app.get(Reader).config.get('app', { infer: true });
    expect(config).toBe(loadConfig(env));
    expect(config).toMatchObject({
      appUrl: 'https://railwright.example.org',
      port: 3400,
      secureCookies: true,
      sessionCookieName: '__Host-railwright.sid',
      host: '127.0.0.1',
    });
    // Nothing of it is copied into the process's environment.
    expect(process.env.appUrl).toBeUndefined();
    await app.close();
  });

  it('keeps the defaults: port 3000 on 127.0.0.1, the address made from them, plain cookies', async () => {
    const app = await contextFor({ ...GOOD });
    expect(app.get(Reader).config.get('app', { infer: true })).toMatchObject({
      port: 3000,
      host: '127.0.0.1',
      appUrl: 'http://127.0.0.1:3000',
      secureCookies: false,
      sessionCookieName: 'railwright.sid',
      trustProxy: false,
      databaseOwnerUrl: null,
    });
    await app.close();
  });

  it('stops the boot naming every bad value at once', async () => {
    await expect(
      contextFor({
        DATABASE_URL: 'mysql://x',
        PORT: '70000',
        NODE_ENV: 'production',
        TRUST_PROXY: 'sometimes',
        PUBLIC_URL: 'ftp://x',
      }),
    ).rejects.toThrow(
      'Configuration: DATABASE_URL must be a postgres:// URL; PORT must be a whole number from 1 to 65535; SESSION_SECRET is required when NODE_ENV=production (at least 32 random characters, kept secret); TRUST_PROXY must be true, false, a number of proxy hops, or comma-separated proxy addresses; PUBLIC_URL must be an http:// or https:// address',
    );
  });
});
