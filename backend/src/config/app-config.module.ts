import { ConfigModule } from '@nestjs/config';
import { loadConfig, type AppConfig } from './config.js';

/**
 * What ConfigService holds: the checked configuration under one key (an object, so ConfigModule
 * copies none of it into process.env). Inject `ConfigService<RailwrightConfig, true>` and read
 * `config.get('app', { infer: true })`.
 */
export interface RailwrightConfig {
  app: AppConfig;
}

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
