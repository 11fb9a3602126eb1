/**
 * The console watch every spec runs under (support/test.ts): a console error or an uncaught page error fails the
 * test, and every spec takes its `test` from there.
 */
import fs from 'node:fs';
import path from 'node:path';
import { expect, test } from './support/test';

test('every spec takes its test from the shared console watch', () => {
  const dir = path.resolve('tests/e2e');
  const specs = fs.readdirSync(dir).filter((f) => f.endsWith('.spec.ts'));
  expect(specs.length).toBeGreaterThan(5);
  for (const spec of specs) {
    const source = fs.readFileSync(path.join(dir, spec), 'utf8');
    expect(source, spec).toMatch(/from '\.\/support\/test'/);
    expect(source, spec).not.toMatch(/import\s*\{[^}]*\btest\b[^}]*\}\s*from '@playwright\/test'/);
  }
});

test.describe('a test whose page', () => {
  // Each of these must fail: the watch turns what the page logs into a failed test.
  test.fail();

  test('logs a console error fails', async ({ page }) => {
    await page.goto('/sign-in');
    await page.evaluate(() => console.error('something broke'));
  });

  test('throws an uncaught error fails', async ({ page }) => {
    await page.goto('/sign-in');
    await page.evaluate(() =>
      setTimeout(() => {
        throw new Error('uncaught');
      }, 0),
    );
    await page.waitForTimeout(100);
  });
});

test('a test that allows the error it provokes passes, and sees it', async ({ page, consoleErrors }) => {
  await page.goto('/sign-in');
  consoleErrors.allow(/expected by this test/);
  await page.evaluate(() => console.error('expected by this test'));
  await page.evaluate(() => console.error('not allowed'));
  await expect.poll(() => consoleErrors.seen.length).toBe(1);
  expect(consoleErrors.seen[0]).toContain('not allowed');
  consoleErrors.allow(/not allowed/);
});
