import { existsSync } from 'node:fs';
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
  /** Secure cookies only when served over https. */
  secureCookies: boolean;
  appUrl: string;
}

let cached: AppConfig | null = null;

/** The clone's top folder: the first parent holding both backend/ and frontend/. */
function repoRoot(): string {
  let dir = path.dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 10; i++) {
    if (existsSync(path.join(dir, 'backend', 'package.json')) && existsSync(path.join(dir, 'frontend'))) return dir;
    dir = path.dirname(dir);
  }
  return process.cwd();
}

/** Reads and checks the environment once; a bad value stops the boot with a clear message. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  if (cached && env === process.env) return cached;
  const problems: string[] = [];
  const databaseUrl = env.DATABASE_URL ?? '';
  if (!/^postgres(ql)?:\/\//.test(databaseUrl)) problems.push('DATABASE_URL must be a postgres:// URL');
  const databaseOwnerUrl = env.DATABASE_OWNER_URL || null;
  if (databaseOwnerUrl && !/^postgres(ql)?:\/\//.test(databaseOwnerUrl)) problems.push('DATABASE_OWNER_URL must be a postgres:// URL');
  const port = Number(env.PORT ?? 3000);
  if (!Number.isInteger(port) || port < 1 || port > 65535) problems.push('PORT must be a whole number from 1 to 65535');
  const sessionSecret = env.SESSION_SECRET ?? 'railwright-development-session-secret-change-me';
  if (sessionSecret.length < 32) problems.push('SESSION_SECRET must be at least 32 characters');
  if (problems.length) throw new Error('Configuration: ' + problems.join('; '));
  const host = env.HOST ?? '127.0.0.1';
  const dist = env.FRONTEND_DIST ?? path.join(repoRoot(), 'frontend', 'dist');
  const config: AppConfig = {
    databaseUrl,
    databaseOwnerUrl,
    port,
    host,
    sessionSecret,
    frontendDist: env.FRONTEND_DIST === '' ? null : dist,
    secureCookies: env.SECURE_COOKIES === 'true',
    appUrl: env.APP_URL ?? `http://${host}:${port}`,
  };
  if (env === process.env) cached = config;
  return config;
}
