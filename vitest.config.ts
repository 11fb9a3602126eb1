import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { alias: { '@': fileURLToPath(new URL('./', import.meta.url)) } },
  test: {
    // Explicit, so Playwright specs under tests/e2e are never collected here.
    include: ['lib/**/*.test.ts', 'shared/**/*.test.ts', 'db/**/*.test.ts', 'components/**/*.test.ts', 'components/**/*.test.tsx', 'tests/integration/**/*.test.ts', 'app/**/*.test.ts', 'seeds/**/*.test.ts'],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
