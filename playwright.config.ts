import { defineConfig } from '@playwright/test';

// The stack (database, fakes, built apps) is started by scripts/test.ts; the API server process is started by the
// global setup so that a journey can restart it. Debian's Chromium only: never `playwright install`.
const appOrigin = process.env.APP_ORIGIN ?? 'http://127.0.0.1:3100';

export default defineConfig({
  testDir: './tests/e2e',
  testMatch: '**/*.spec.ts',
  globalSetup: './tests/e2e/support/global-setup.ts',
  globalTeardown: './tests/e2e/support/global-teardown.ts',
  workers: 1,
  fullyParallel: false,
  retries: 0,
  timeout: 30_000,
  reporter: [['list'], ['json']],
  outputDir: 'test-results/e2e',
  use: {
    baseURL: appOrigin,
    browserName: 'chromium',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
        '--no-first-run',
        '--disable-quic',
      ],
    },
  },
});
