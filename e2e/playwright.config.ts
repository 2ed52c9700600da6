import { defineConfig } from '@playwright/test';
import path from 'node:path';

// Run through `npm test`, which makes a throwaway database and passes its URL and a free port.
const port = Number(process.env.E2E_PORT ?? 3999);
const root = path.resolve(__dirname, '..');

export default defineConfig({
  testDir: '.',
  testMatch: '**/*.spec.ts',
  outputDir: path.join(root, 'test-results'),
  workers: 1,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [['list']],
  use: {
    baseURL: `http://127.0.0.1:${port}`,
    viewport: { width: 1366, height: 900 },
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    },
    trace: 'off',
    screenshot: 'only-on-failure',
  },
  webServer: {
    command: `node ${process.env.E2E_SERVER ?? path.join(root, 'backend/dist/backend/src/main.js')}`,
    url: `http://127.0.0.1:${port}/api/health`,
    reuseExistingServer: false,
    timeout: 60_000,
    stdout: 'ignore',
    stderr: 'pipe',
    env: {
      PORT: String(port),
      DATABASE_URL: process.env.E2E_DATABASE_URL ?? '',
      ...(process.env.E2E_DATABASE_OWNER_URL ? { DATABASE_OWNER_URL: process.env.E2E_DATABASE_OWNER_URL } : {}),
      SESSION_SECRET: 'e2e-session-secret-that-is-long-enough-123',
      RAILWRIGHT_DATA: process.env.RAILWRIGHT_DATA ?? path.join(root, '.test-data/e2e'),
      ...(process.env.FRONTEND_DIST ? { FRONTEND_DIST: process.env.FRONTEND_DIST } : {}),
      ...(process.env.SMTP_PORT ? { SMTP_PORT: process.env.SMTP_PORT } : {}),
    },
  },
});
