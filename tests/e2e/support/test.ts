/**
 * Playwright's `test` and `expect` for every spec here, with a watch on the browser console. Any console error or
 * uncaught page error, and any Content-Security-Policy violation (a script, style, worker, image or frame the policy
 * refused, whatever level the browser logs it at), in any page the test opens (its own `page`, or pages from
 * `browser.newPage()` and `browser.newContext()`), fails the test when it ends, with the messages and the page they
 * came from. Specs import from this module, never from '@playwright/test' directly
 * (tests/e2e/console-watch.spec.ts checks).
 *
 * A test that provokes an error on purpose (a refused request the page reports) says so with
 * `consoleErrors.allow(/pattern/)`; CSP violations are never allowed.
 */
import { test as base, expect, type Browser, type BrowserContext, type ConsoleMessage } from '@playwright/test';

export { expect };
export type { Page, Locator, BrowserContext } from '@playwright/test';

const CSP_VIOLATION = /Content Security Policy|Refused to (load|execute|apply|create|connect|frame)/i;

export interface ConsoleErrors {
  /** Allows console errors matching the pattern for the rest of this test. */
  allow(pattern: RegExp): void;
  /** The errors seen so far that no pattern allows. */
  readonly seen: readonly string[];
}

export const test = base.extend<{ consoleErrors: ConsoleErrors }>({
  consoleErrors: [
    async ({ context, browser }, use) => {
      const allowed: RegExp[] = [];
      const errors: string[] = [];
      const violations: string[] = [];
      const record = (text: string) => {
        if (!allowed.some((a) => a.test(text))) errors.push(text);
      };
      const watch = (ctx: BrowserContext) => {
        ctx.on('console', (msg: ConsoleMessage) => {
          if (CSP_VIOLATION.test(msg.text())) violations.push(msg.text());
          if (msg.type() !== 'error') return;
          const at = msg.location().url || msg.page()?.url() || '';
          record(`console error on ${msg.page()?.url() ?? '?'}: ${msg.text()}${at ? ` (${at})` : ''}`);
        });
        ctx.on('weberror', (err) => record(`page error on ${err.page()?.url() ?? '?'}: ${err.error().stack ?? err.error().message}`));
      };
      watch(context);
      const restore = watchNewContexts(browser, watch);
      await use({
        allow: (pattern) => allowed.push(pattern),
        get seen() {
          return errors.filter((e) => !allowed.some((a) => a.test(e)));
        },
      });
      restore();
      expect(violations, 'Content-Security-Policy violations in the console').toEqual([]);
      expect(
        errors.filter((e) => !allowed.some((a) => a.test(e))),
        'The browser console must stay clean',
      ).toEqual([]);
    },
    { auto: true },
  ],
});

/** Contexts a test makes itself (`browser.newPage()` makes one too) get the same watch. */
function watchNewContexts(browser: Browser, watch: (ctx: BrowserContext) => void) {
  const original = browser.newContext;
  browser.newContext = async function (this: Browser, ...args: Parameters<Browser['newContext']>) {
    const ctx = await original.apply(this, args);
    watch(ctx);
    return ctx;
  };
  return () => {
    browser.newContext = original;
  };
}
