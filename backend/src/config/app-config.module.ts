import { ConfigModule, ConfigService } from '@nestjs/config';
import { loadConfig, type AppConfig } from './config.js';

/** What ConfigService holds: the checked configuration under one key (never copied into process.env). */
export interface RailwrightConfig {
  app: AppConfig;
}

/** Inject this (ConfigService typed for Railwright) and read `config.get('app', { infer: true })`. */
export class AppConfigService extends ConfigService<RailwrightConfig, true> {}

/**
 * ConfigModule for the environment the app is started with (tests start apps with their own).
 * No .env file is read; `validate` applies every rule of config.ts, so a bad value stops the boot
 * with the same message as before.
 */
export function appConfigModule(env: NodeJS.ProcessEnv = process.env) {
  return ConfigModule.forRoot({
    isGlobal: true,
    ignoreEnvFile: true,
    ignoreEnvVars: true,
    cache: true,
    validate: (): RailwrightConfig => ({ app: loadConfig(env) }),
  });
}
