import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export interface AppConfig {
  databaseUrl: string;
  /** The schema owner's connection, for migrations only; the application itself connects as DATABASE_URL's role. */
  databaseOwnerUrl: string | null;
  port: number;
  host: string;
  sessionSecret: string;
  /** Built single-page app; absent in API tests. */
  frontendDist: string | null;
  /** Secure cookies whenever the public URL is https (or SECURE_COOKIES=true). */
  secureCookies: boolean;
  /** The session cookie's name: `__Host-` prefixed when Secure, so only this host over https can set it. */
  sessionCookieName: string;
  /** The address people open, e.g. https://railwright.example.org; its origin is the only one allowed to write. */
  appUrl: string;
  /** Further origins allowed to write: the Vite dev server outside production. */
  extraOrigins: string[];
  /** Fastify's trustProxy: false, true, a hop count, or a list of proxy addresses. */
  trustProxy: boolean | number | string;
}

const DEV_SERVER_ORIGINS = ['http://127.0.0.1:5173', 'http://localhost:5173'];

/** TRUST_PROXY: unset/false → the socket's address; true → the left-most forwarded one; 1, 2 … hops; or addresses/CIDRs. */
export function parseTrustProxy(value: string | undefined, problems: string[]): boolean | number | string {
  if (value === undefined || value === '' || value === 'false') return false;
  if (value === 'true') return true;
  if (/^\d+$/.test(value)) return Number(value);
  if (/^[0-9a-fA-F.:/, ]+$/.test(value)) return value;
  problems.push('TRUST_PROXY must be true, false, a number of proxy hops, or comma-separated proxy addresses');
  return false;
}

/**
 * Outside production a missing SESSION_SECRET is made once, at random, and kept in the data
 * folder, so no two installations share one and a restart keeps people signed in.
 */
function developmentSecret(env: NodeJS.ProcessEnv): string {
  const folder = env.RAILWRIGHT_DATA ?? path.join(repoRoot(), '.data');
  const file = path.join(folder, 'session-secret');
  try {
    const kept = readFileSync(file, 'utf8').trim();
    if (kept.length >= 32) return kept;
  } catch {
    // not made yet
  }
  const secret = randomBytes(36).toString('base64url');
  try {
    mkdirSync(folder, { recursive: true });
    writeFileSync(file, secret, { mode: 0o600 });
  } catch {
    // a read-only folder: this process's random secret still works until it stops
  }
  return secret;
}

/** The clone's top folder: the first parent holding both backend/ and frontend/. */
function repoRoot(): string {
  let dir = path.dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 10; i++) {
    if (existsSync(path.join(dir, 'backend', 'package.json')) && existsSync(path.join(dir, 'frontend'))) return dir;
    dir = path.dirname(dir);
  }
  return process.cwd();
}

/**
 * Checks the environment and makes the configuration; a bad value stops the boot with a clear
 * message naming every problem. The rules behind ConfigModule's `validate` (app-config.module.ts).
 */
export function validateEnvironment(env: NodeJS.ProcessEnv): AppConfig {
  const problems: string[] = [];
  const databaseUrl = env.DATABASE_URL ?? '';
  if (!/^postgres(ql)?:\/\//.test(databaseUrl)) problems.push('DATABASE_URL must be a postgres:// URL');
  const databaseOwnerUrl = env.DATABASE_OWNER_URL || null;
  if (databaseOwnerUrl && !/^postgres(ql)?:\/\//.test(databaseOwnerUrl))
    problems.push('DATABASE_OWNER_URL must be a postgres:// URL');
  const port = Number(env.PORT ?? 3000);
  if (!Number.isInteger(port) || port < 1 || port > 65535) problems.push('PORT must be a whole number from 1 to 65535');
  const production = env.NODE_ENV === 'production';
  if (production && !env.SESSION_SECRET) {
    problems.push('SESSION_SECRET is required when NODE_ENV=production (at least 32 random characters, kept secret)');
  }
  const sessionSecret = env.SESSION_SECRET ?? (production ? '' : developmentSecret(env));
  if (env.SESSION_SECRET !== undefined && sessionSecret.length < 32)
    problems.push('SESSION_SECRET must be at least 32 characters');
  const trustProxy = parseTrustProxy(env.TRUST_PROXY, problems);
  const host = env.HOST ?? '127.0.0.1';
  const appUrl = env.PUBLIC_URL ?? env.APP_URL ?? `http://${host}:${port}`;
  if (!/^https?:\/\/[^/]+/.test(appUrl)) problems.push('PUBLIC_URL must be an http:// or https:// address');
  if (problems.length) throw new Error('Configuration: ' + problems.join('; '));
  const dist = env.FRONTEND_DIST ?? path.join(repoRoot(), 'frontend', 'dist');
  const secureCookies = env.SECURE_COOKIES === 'true' || appUrl.startsWith('https://');
  const config: AppConfig = {
    databaseUrl,
    databaseOwnerUrl,
    port,
    host,
    sessionSecret,
    frontendDist: env.FRONTEND_DIST === '' ? null : dist,
    secureCookies,
    sessionCookieName: secureCookies ? '__Host-railwright.sid' : 'railwright.sid',
    appUrl,
    extraOrigins: production ? [] : [...DEV_SERVER_ORIGINS, `http://127.0.0.1:${port}`, `http://localhost:${port}`],
    trustProxy,
  };
  return config;
}

// One configuration per environment object: the app's ConfigService and the code outside Nest
// (main.ts before the app exists, scripts, tests) read the same object.
const made = new WeakMap<NodeJS.ProcessEnv, AppConfig>();

/** The configuration outside Nest's injection (main.ts, scripts, tests); inside, inject ConfigService (app-config.module.ts). */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  let config = made.get(env);
  if (!config) made.set(env, (config = validateEnvironment(env)));
  return config;
}
