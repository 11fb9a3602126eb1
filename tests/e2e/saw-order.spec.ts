import fs from 'node:fs';
import { expect, test, type Page } from './support/test';
import { PDFDocument } from 'pdf-lib';
import { shot, signIn } from './support/session';
import { jobId } from './support/plans';

/** The demo shop's released kitchen plan, found the way any client would: through the API. */
async function kitchenPlan(page: Page) {
  const list = await (await page.request.get(`/api/jobs/${await jobId(page, 'Hollis kitchen')}/plans`)).json();
  const plans: { id: string; status: string }[] = Array.isArray(list) ? list : list.plans;
  const planId = plans.find((p) => p.status === 'released' || p.status === 'cutting')!.id;
  const plan = await (await page.request.get(`/api/plans/${planId}`)).json();
  const pieces: { placements: unknown[]; sawOrder?: unknown[] }[] = plan.document.pieces;
  return { planId, pieces };
}

test('a cutter opens the shop floor, cuts the released kitchen plan step by step, and the ticks survive a reload', async ({ page }) => {
  await signIn(page, 'cutter');
  await page.goto('/shop-floor');
  await expect(page.getByRole('complementary', { name: 'Saw safety' })).toContainText('manual');
  const card = page.getByTestId('queue-plan').filter({ hasText: 'Hollis kitchen' });
  await expect(card).toContainText('0 of');
  await shot(page, 'shop-floor-queue');

  await card.click();
  await expect(page.getByRole('heading', { level: 1, name: /Hollis kitchen/ })).toBeVisible();
  await expect(page.getByTestId('current-fence')).toBeVisible();
  await expect(page.getByRole('complementary', { name: 'Saw safety' })).toBeVisible();
  await shot(page, 'shop-floor-cutting');

  const saved = () => page.waitForResponse((r) => r.url().includes('/steps') && r.request().method() !== 'GET' && r.status() === 200);
  await Promise.all([saved(), page.getByRole('button', { name: 'Done — cut 1' }).click()]);
  await expect(page.getByRole('checkbox', { name: 'Cut 1 done' })).toHaveAttribute('aria-checked', 'true');
  // The next cut comes up on its own.
  await expect(page.getByRole('button', { name: 'Done — cut 2' })).toBeVisible();
  await Promise.all([saved(), page.getByRole('checkbox', { name: 'Cut 2 done' }).click()]);
  await Promise.all([saved(), page.getByRole('checkbox', { name: 'Cut 3 done' }).click()]);
  await Promise.all([saved(), page.getByRole('checkbox', { name: 'Cut 3 done' }).click()]);

  await page.reload();
  await expect(page.getByRole('checkbox', { name: 'Cut 1 done' })).toHaveAttribute('aria-checked', 'true');
  await expect(page.getByRole('checkbox', { name: 'Cut 2 done' })).toHaveAttribute('aria-checked', 'true');
  await expect(page.getByRole('checkbox', { name: 'Cut 3 done' })).toHaveAttribute('aria-checked', 'false');
  await expect(page.getByText('Ticked by Ines Halvorsen').first()).toBeVisible();
  await expect(page.getByRole('heading', { level: 1 })).toContainText('Cutting');
  await expect(page.getByRole('button', { name: 'Done — cut 3' })).toBeVisible();
  // Cutters never see prices.
  await expect(page.locator('main')).not.toContainText('$');
  await shot(page, 'shop-floor-ticked');
});

test('the estimator opens the saw order, prints it a piece per page, and downloads the PDF', async ({ page }) => {
  await signIn(page, 'estimator');
  const { planId, pieces } = await kitchenPlan(page);
  await page.goto(`/plans/${planId}/saw-order`);
  await expect(page.getByRole('heading', { level: 1, name: /Saw order/ })).toBeVisible();
  await expect(page.getByTestId('saw-order-piece')).toHaveCount(pieces.length);
  const steps = pieces.reduce((n, p) => n + (p.sawOrder?.length ?? 0), 0);
  await expect(page.getByTestId('saw-step')).toHaveCount(steps);
  await expect(page.getByRole('complementary', { name: 'Saw safety' })).toContainText('licensed practice');
  await shot(page, 'saw-order');
  await page.setViewportSize({ width: 816, height: 1056 }); // Letter at 96 px to the inch, for the print screenshot

  await page.emulateMedia({ media: 'print' });
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeHidden();
  await expect(page.getByRole('button', { name: 'Print' })).toBeHidden();
  const breaks = await page.getByTestId('saw-order-piece').evaluateAll((els) => els.map((e) => getComputedStyle(e).breakBefore));
  expect(breaks.slice(1).every((b) => b === 'page')).toBe(true);
  await shot(page, 'saw-order-print');
  // Printed by Chromium itself on Letter paper: each stock piece fills exactly one page.
  const printed = await PDFDocument.load(await page.pdf({ format: 'Letter', preferCSSPageSize: true }));
  expect(printed.getPageCount()).toBe(pieces.length);
  // The cautions are on every printed piece.
  await expect(page.getByTestId('saw-order-piece').filter({ hasText: 'licensed practice' })).toHaveCount(pieces.length);
  await page.emulateMedia({ media: 'screen' });

  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Download PDF' }).click()]);
  expect(download.suggestedFilename()).toBe('saw-order-Hollis-kitchen.pdf');
  const bytes = fs.readFileSync(await download.path());
  expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
  const pdf = await PDFDocument.load(bytes);
  expect(pdf.getPageCount()).toBe(pieces.length);
});

test('part tags print one per part on a chosen label sheet, and a tag leads to its part', async ({ page }) => {
  await signIn(page, 'estimator');
  const { planId, pieces } = await kitchenPlan(page);
  await page.goto(`/plans/${planId}/saw-order`);
  await page.getByRole('link', { name: 'Part tags' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Part tags' })).toBeVisible();
  const placed = pieces.reduce((n, p) => n + p.placements.length, 0);
  await expect(page.getByTestId('part-tag')).toHaveCount(placed);
  await expect(page.getByTestId('label-sheet')).toHaveCount(Math.ceil(placed / 30));
  await shot(page, 'part-tags-letter');

  await page.getByRole('link', { name: /A4, 3 × 8/ }).click();
  await expect(page).toHaveURL(/sheet=a4-24/);
  await expect(page.getByTestId('label-sheet')).toHaveCount(Math.ceil(placed / 24));
  await page.emulateMedia({ media: 'print' });
  await expect(page.getByRole('button', { name: 'Print tags' })).toBeHidden();
  await shot(page, 'part-tags-a4-print');
  // Printed by Chromium on the sheet's own page size (A4, 595.28 × 841.89 pt, ISO 216), a label sheet a page.
  const printed = await PDFDocument.load(await page.pdf({ preferCSSPageSize: true }));
  expect(printed.getPageCount()).toBe(Math.ceil(placed / 24));
  expect(printed.getPage(0).getWidth()).toBeCloseTo(595.28, 0);
  expect(printed.getPage(0).getHeight()).toBeCloseTo(841.89, 0);
  await page.emulateMedia({ media: 'screen' });
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Download PDF' }).click()]);
  const tagsPdf = await PDFDocument.load(fs.readFileSync(await download.path()));
  expect(tagsPdf.getPageCount()).toBe(Math.ceil(placed / 24));

  const qr = await page
    .getByRole('img', { name: /^QR code: / })
    .first()
    .getAttribute('aria-label');
  const url = new URL(qr!.replace('QR code: ', ''));
  expect(url.pathname).toMatch(/^\/parts\/[0-9a-f-]{36}$/);
  await page.goto(url.pathname + url.search);
  await expect(page.getByRole('heading', { name: /cut from piece A/ })).toBeVisible();
  await expect(page.getByRole('heading', { level: 1 })).toContainText('#1');
  await shot(page, 'part-page');
});

test('the estimator nests the kitchen on the shop’s saws (track saw breaking down, cabinet saw after) and the saw order names the saw of every cut', async ({
  page,
}) => {
  test.setTimeout(120_000);
  await signIn(page, 'estimator');
  await page.goto(`/jobs/${await jobId(page, 'Hollis kitchen')}/plan`);
  // The defaults: the cabinet saw, with the track saw breaking the sheets down.
  await expect(page.getByLabel('Cut on')).toHaveValue(/.+/);
  await expect(page.getByLabel('Cut on').locator('option:checked')).toHaveText(/Cabinet saw/);
  await expect(page.getByLabel('Break sheets down on').locator('option:checked')).toHaveText(/Track saw/);
  await page.getByLabel('Search for (seconds)').fill('1');
  await page.getByRole('button', { name: /^Nest \d+ parts?$/ }).click();
  await expect(page.getByTestId('plan-summary')).toBeVisible({ timeout: 30_000 });
  await page.getByLabel('Plan name').fill('Kitchen on the saws');
  await page.getByRole('button', { name: 'Save as draft plan' }).click();
  await expect(page.getByRole('heading', { name: /Kitchen on the saws/ })).toBeVisible();
  const planId = page.url().split('/').pop()!;

  const plan = await (await page.request.get(`/api/plans/${planId}`)).json();
  // The stored plan keeps the saws it was nested for, and every step names one of them.
  expect(plan.request.settings.saw.name).toBe('Cabinet saw');
  expect(plan.request.settings.breakdownSaw.name).toBe('Track saw');
  const steps: { saw?: string }[] = plan.document.pieces.flatMap((p: { sawOrder?: { saw?: string }[] }) => p.sawOrder ?? []);
  expect(steps.length).toBeGreaterThan(0);
  for (const s of steps) expect(['Cabinet saw', 'Track saw']).toContain(s.saw);

  await page.goto(`/plans/${planId}/saw-order`);
  await expect(page.getByTestId('saw-step')).toHaveCount(steps.length);
  await expect(page.getByTestId('step-saw')).toHaveCount(steps.length);
  await expect(page.getByTestId('step-saw').filter({ hasText: 'Track saw' }).first()).toBeVisible();
  await expect(page.getByTestId('step-saw').filter({ hasText: 'Cabinet saw' }).first()).toBeVisible();
  await expect(page.getByTestId('saw-order-piece').first()).toContainText('on ');
  await shot(page, 'saw-order-saws');
  await page
    .getByTestId('saw-order-piece')
    .nth(1)
    .screenshot({ path: `test-results/screens-${process.env.E2E_PORT ?? 'main'}/saw-order-saws-piece.png` });
  await page.setViewportSize({ width: 390, height: 844 });
  await expect(page.getByTestId('step-saw').first()).toBeVisible();
  // Nothing of a step card runs off a phone's screen.
  const overflow = await page
    .getByTestId('saw-step')
    .first()
    .evaluate((el) => el.scrollWidth - el.clientWidth);
  expect(overflow).toBeLessThanOrEqual(0);
  await shot(page, 'saw-order-saws-390');
  await page
    .getByTestId('saw-step')
    .nth(1)
    .screenshot({ path: `test-results/screens-${process.env.E2E_PORT ?? 'main'}/saw-order-saws-390-step.png` });
});

test('the owner keeps the shop’s saws in Shop settings: the demo’s two, a new one in inches, and the caution at the fence minimum', async ({
  page,
}) => {
  await signIn(page, 'owner');
  await page.goto('/settings');
  const section = page.getByRole('region', { name: 'Saws' });
  const list = section.getByRole('list', { name: 'Saws' });
  await expect(list.getByRole('listitem')).toHaveCount(2);
  await expect(list.getByRole('listitem').first()).toContainText('Cabinet saw');
  await expect(list.getByRole('listitem').first()).toContainText('30″');
  await expect(list.getByRole('listitem').first()).toContainText('at most 3, rips first');
  await section.getByRole('button', { name: 'Add a saw' }).click();
  const form = page.getByRole('form', { name: 'New saw' });
  await expect(form.getByRole('note')).toContainText('saw’s manual');
  await form.getByLabel('Name').fill('Slider');
  await form.getByLabel('Kind').selectOption('sliding-table-saw');
  await form.getByLabel('Kerf').fill('1/8');
  await form.getByLabel('Rip capacity').fill('50');
  await form.getByLabel('Crosscut capacity').fill('100');
  await form.getByLabel('Stages of cuts').selectOption('any');
  await form.getByLabel('Narrowest strip between blade and fence').fill('1');
  for (const width of [1440, 820, 390]) {
    await page.setViewportSize({ width, height: 900 });
    await section.screenshot({ path: `test-results/screens-${process.env.E2E_PORT ?? 'main'}/settings-saws-${width}.png` });
  }
  await form.getByRole('button', { name: 'Add the saw' }).click();
  await expect(list.getByRole('listitem')).toHaveCount(3);
  await expect(list.getByRole('listitem').nth(2)).toContainText('Sliding table saw');
  await expect(list.getByRole('listitem').nth(2)).toContainText('any number, rips first');
});
