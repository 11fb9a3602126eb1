import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: {
    alias: {
      '@': fileURLToPath(new URL('./', import.meta.url)),
      // The marker package throws outside React Server Components; node tests exercise server code directly.
      'server-only': fileURLToPath(new URL('./tests/support/empty-module.ts', import.meta.url)),
    },
  },
  test: {
    // Explicit, so Playwright specs under tests/e2e are never collected here.
    include: [
      'lib/**/*.test.ts',
      'server/**/*.test.ts',
      'client/**/*.test.ts',
      'bench/**/*.test.ts',
      'shared/**/*.test.ts',
      'db/**/*.test.ts',
      'components/**/*.test.{ts,tsx}',
      'app/**/*.test.ts',
      'seeds/**/*.test.ts',
      'workers/**/*.test.ts',
      'tests/integration/**/*.test.ts',
      'tests/house-rules/**/*.test.ts',
    ],
    environment: 'node',
    // Request log lines (server/log.ts) would bury the test output; tests that read them send them to a stream.
    env: { LOG_LEVEL: 'silent' },
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
