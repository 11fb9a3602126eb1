import { defineConfig } from '@playwright/test';
import { E2E_URL } from './tests/e2e/support/server';

// Debian's Chromium, headless, with background networking off: nothing is downloaded and nothing leaves the machine.
export default defineConfig({
  testDir: './tests/e2e',
  testMatch: '**/*.spec.ts',
  outputDir: `./test-results/e2e-${process.env.E2E_PORT ?? 'main'}`,
  workers: 1,
  fullyParallel: false,
  retries: 0,
  timeout: 60_000,
  reporter: [['list']],
  globalSetup: './tests/e2e/support/global-setup.ts',
  globalTeardown: './tests/e2e/support/global-teardown.ts',
  use: {
    baseURL: E2E_URL,
    screenshot: 'only-on-failure',
    trace: 'off',
    viewport: { width: 1360, height: 860 },
    // What a browser sends with its own pages' requests; API calls made with page.request carry it too, so the
    // server's same-origin check (lib/api/request-guard.ts) sees them as the app's own. A spec that plays another
    // site overrides it per request.
    extraHTTPHeaders: { origin: E2E_URL },
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    },
  },
});
