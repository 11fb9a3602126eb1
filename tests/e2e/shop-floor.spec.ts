/**
 * The cutter's view at the saw, on a phone, a tablet and a small laptop: the fence setting on one line and as
 * large as fits, Done a thumb-sized button, the cut's diagram above the fold, Space ticks the cut on screen, and the
 * screen is kept awake while the view is open.
 */
import { clippedText, pageOverflow } from './support/layout-checks';
import { jobId } from './support/plans';
import { shot, signIn } from './support/session';
import { expect, test, type Page } from './support/test';

/** The demo kitchen's released plan. */
async function kitchenPlanId(page: Page) {
  const list = await (await page.request.get(`/api/jobs/${await jobId(page, 'Hollis kitchen')}/plans`)).json();
  const plans: { id: string; status: string }[] = Array.isArray(list) ? list : list.plans;
  return plans.find((p) => p.status === 'released' || p.status === 'cutting')!.id;
}

/** A stand-in Screen Wake Lock that counts what the page asks for, and a way to hide and show the page. */
const FAKE_WAKE_LOCK = () => {
  const log = { requests: 0, releases: 0, held: 0 };
  const held = new Set<{ drop: () => void }>();
  let visibility: DocumentVisibilityState = 'visible';
  Object.defineProperty(document, 'visibilityState', { configurable: true, get: () => visibility });
  Object.defineProperty(document, 'hidden', { configurable: true, get: () => visibility !== 'visible' });
  class Sentinel extends EventTarget {
    released = false;
    readonly type = 'screen';
    onrelease = null;
    drop() {
      if (this.released) return;
      this.released = true;
      held.delete(this);
      log.releases += 1;
      log.held -= 1;
      this.dispatchEvent(new Event('release'));
    }
    async release() {
      this.drop();
    }
  }
  Object.defineProperty(navigator, 'wakeLock', {
    configurable: true,
    value: {
      request: async () => {
        log.requests += 1;
        log.held += 1;
        const s = new Sentinel();
        held.add(s);
        return s;
      },
    },
  });
  Object.assign(window, {
    __wake: log,
    // As a browser does: hiding the page lets go of every wake lock, then says the visibility changed.
    __setVisibility: (v: DocumentVisibilityState) => {
      visibility = v;
      if (v === 'hidden') for (const s of [...held]) s.drop();
      document.dispatchEvent(new Event('visibilitychange'));
    },
  });
};

const wake = (page: Page) => page.evaluate(() => (window as unknown as { __wake: { requests: number; releases: number; held: number } }).__wake);

for (const vp of [
  { width: 390, height: 844 },
  { width: 820, height: 1180 },
  { width: 1024, height: 768 },
]) {
  test.describe(`at ${vp.width} × ${vp.height}`, () => {
    test.use({ viewport: vp });

    test('the fence setting is on one line and large, Done is thumb-sized, and the diagram is above the fold', async ({ page }) => {
      await signIn(page, 'cutter');
      await page.goto(`/shop-floor/${await kitchenPlanId(page)}`);
      const fence = page.getByTestId('current-fence');
      await expect(fence).toBeVisible();
      const f = await fence.evaluate((el) => {
        const style = getComputedStyle(el);
        const range = document.createRange();
        range.selectNodeContents(el);
        return {
          lines: range.getClientRects().length,
          fontSize: parseFloat(style.fontSize),
          scroll: el.scrollWidth,
          client: el.clientWidth,
          text: el.textContent ?? '',
        };
      });
      expect(f.lines, `"${f.text}" on one line`).toBe(1);
      expect(f.scroll).toBeLessThanOrEqual(f.client + 1);
      // Readable from the saw: at least 3 rem (48 px) on a phone, larger where there is room.
      expect(f.fontSize).toBeGreaterThanOrEqual(vp.width < 500 ? 48 : 56);

      const done = page.getByRole('button', { name: /^Done — cut \d+$/ });
      const d = (await done.boundingBox())!;
      // A thumb is about 16–20 mm wide (common practice, no source): at least 64 px high, most of the card wide.
      expect(d.height).toBeGreaterThanOrEqual(64);
      expect(d.width).toBeGreaterThanOrEqual(Math.min(300, vp.width * 0.3));
      const diagram = page.getByTestId('current-cut').getByRole('img').first();
      const g = (await diagram.boundingBox())!;
      expect(g.y + g.height, 'the diagram ends above the fold').toBeLessThanOrEqual(vp.height);
      expect(d.y + d.height, 'Done is on the first screen').toBeLessThanOrEqual(vp.height);
      await expect(page.getByTestId('cutting-hints')).toContainText('Space');

      expect(await pageOverflow(page)).toBeNull();
      expect(await clippedText(page)).toEqual([]);
      await page.screenshot({
        path: `test-results/screens${process.env.E2E_PORT ? '-' + process.env.E2E_PORT : ''}/cutting-first-screen-${vp.width}.png`,
      });
    });
  });
}

test('Space ticks the cut on screen, once, and says so; a focused control keeps its own Space', async ({ page }) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await signIn(page, 'cutter');
  await page.goto(`/shop-floor/${await kitchenPlanId(page)}`);
  const done = page.getByRole('button', { name: /^Done — cut \d+$/ });
  const n = Number((await done.textContent())!.match(/\d+/)![0]);
  // The hint offers Space once the key is live (the page's script has taken over from its first HTML).
  await expect(page.getByTestId('cutting-hints')).toContainText('Space');
  await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
  const saved = page.waitForResponse((r) => r.url().includes('/steps') && r.request().method() === 'POST' && r.status() === 200);
  await page.keyboard.press('Space');
  await saved;
  await expect(page.getByRole('checkbox', { name: `Cut ${n} done` })).toHaveAttribute('aria-checked', 'true');
  await expect(page.getByRole('button', { name: `Done — cut ${n + 1}` })).toBeVisible();
  await expect(page.getByRole('checkbox', { name: `Cut ${n + 1} done` })).toHaveAttribute('aria-checked', 'false');
  await shot(page, 'cutting-after-space');

  // On a focused tick box, Space is that box's own: it takes back this tick, and the next cut stays open.
  const unticked = page.waitForResponse((r) => r.url().includes('/steps') && r.request().method() === 'DELETE' && r.status() === 200);
  await page.getByRole('checkbox', { name: `Cut ${n} done` }).focus();
  await page.keyboard.press('Space');
  await unticked;
  await expect(page.getByRole('checkbox', { name: `Cut ${n} done` })).toHaveAttribute('aria-checked', 'false');
  await expect(page.getByRole('checkbox', { name: `Cut ${n + 1} done` })).toHaveAttribute('aria-checked', 'false');
});

test('the screen is kept awake while cutting, asked again when the page comes back, and let go on leaving', async ({ page }) => {
  await page.addInitScript(FAKE_WAKE_LOCK);
  await signIn(page, 'cutter');
  await page.goto(`/shop-floor/${await kitchenPlanId(page)}`);
  await expect.poll(async () => (await wake(page)).held).toBe(1);
  await expect(page.getByTestId('wake-state')).toHaveText('The screen stays on while this page is open.');

  await page.evaluate(() => (window as unknown as { __setVisibility: (v: string) => void }).__setVisibility('hidden'));
  await expect.poll(async () => (await wake(page)).held).toBe(0);
  await page.evaluate(() => (window as unknown as { __setVisibility: (v: string) => void }).__setVisibility('visible'));
  await expect.poll(async () => await wake(page)).toEqual({ requests: 2, releases: 1, held: 1 });
  await expect(page.getByTestId('wake-state')).toHaveText('The screen stays on while this page is open.');

  await page.getByRole('link', { name: '← Shop floor' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Shop floor' })).toBeVisible();
  await expect.poll(async () => await wake(page)).toEqual({ requests: 2, releases: 2, held: 0 });
});

test('without the Screen Wake Lock API the cutter is told to lengthen the screen timeout', async ({ page }) => {
  await page.addInitScript(() => Object.defineProperty(navigator, 'wakeLock', { configurable: true, value: undefined }));
  await signIn(page, 'cutter');
  await page.goto(`/shop-floor/${await kitchenPlanId(page)}`);
  await expect(page.getByTestId('wake-state')).toHaveText('This browser cannot keep the screen awake: set its screen timeout longer.');
});
