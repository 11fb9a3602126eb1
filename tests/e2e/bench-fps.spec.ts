/**
 * A drag among 340 parts on the Layout bench, as a person would make it: the drop is checked in the live-check
 * worker (under the app's CSP) and the status comes back answered; undo puts the part back. What it does not do is
 * time anything: the frame figures are measured by `npm run bench:layout` (bench/layout-fps.ts), since performance
 * targets live in benchmarks, never in timed tests.
 */
import { expect, test } from './support/test';
import { fitView, layoutPieces, toScreen } from '../../lib/layout-bench/world';
import { shot, signIn } from './support/session';

const MAPLE_23_32 = (23 / 32) * 25.4; // ≈3/4″ maple ply as the demo rack stocks it
const ROWS = [
  { label: 'Drawer side', quantity: 160, length: 400, width: 120 },
  { label: 'Drawer front', quantity: 100, length: 380, width: 110 },
  { label: 'Shelf cleat', quantity: 80, length: 300, width: 60 },
];
const MOVES = 120;

test('a part dragged among 340 parts is checked in the worker when dropped, and undone', async ({ page }) => {
  test.setTimeout(180_000);
  await signIn(page, 'estimator');
  const job = await (await page.request.post('/api/jobs', { data: { name: `Frame-rate drawer run ${Date.now()}` } })).json();
  for (const row of ROWS) {
    const res = await page.request.post(`/api/jobs/${job.id}/parts`, {
      data: { ...row, thickness: MAPLE_23_32, material: 'Maple ply', grain: 'any' },
    });
    expect(res.status(), await res.text()).toBe(201);
  }

  await page.goto(`/jobs/${job.id}/plan`);
  await page.getByLabel('Search for (seconds)').fill('0');
  await page.getByRole('button', { name: 'Nest 340 parts' }).click();
  await expect(page.getByTestId('plan-summary')).toBeVisible({ timeout: 60_000 });
  await page.getByRole('button', { name: 'Save as draft plan' }).click();
  await expect(page.getByTestId('bench-status')).toBeVisible({ timeout: 30_000 });
  const planId = page.url().split('/').pop()!;
  const { document } = await (await page.request.get(`/api/plans/${planId}`)).json();
  const parts = document.pieces.reduce((n: number, p: { placements: unknown[] }) => n + p.placements.length, 0);
  expect(parts).toBe(340);

  const canvas = page.getByTestId('bench-canvas').locator('canvas').first();
  await canvas.scrollIntoViewIfNeeded();
  const box = (await canvas.boundingBox())!;
  const frames = layoutPieces(document.pieces);
  const view = fitView(frames, Math.floor(box.width), Math.floor(box.height));
  const target = document.pieces[0].placements[0];
  const start = toScreen(view, frames[0], target.x + target.w / 2, target.y + target.h / 2);
  const piece = frames[0];

  await page.mouse.move(box.x + start.x, box.y + start.y);
  await page.mouse.down();
  for (let i = 1; i <= MOVES; i++) {
    const a = (i / MOVES) * Math.PI * 2;
    const to = toScreen(view, piece, piece.w / 2 + Math.cos(a) * piece.w * 0.35, piece.h / 2 + Math.sin(a) * piece.h * 0.35);
    await page.mouse.move(box.x + to.x, box.y + to.y);
    await page.waitForTimeout(16);
  }
  // The drop: the moved layout is checked in the bench's own worker (none other runs on this page now).
  await page.mouse.up();
  await expect(page.getByTestId('bench-status')).toHaveAttribute('data-pending', 'false');
  await expect(page.getByTestId('bench-status')).toContainText(/straight through-cuts|problem/);
  const names = await Promise.all(page.workers().map((w) => w.evaluate(() => self.name)));
  expect(names, 'the live check runs in its own worker').toContain('kerfwise-bench-check');
  await expect(page.getByRole('button', { name: 'Undo' })).toBeEnabled();
  await shot(page, 'bench-fps-after-drag');
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(page.getByTestId('bench-status')).toHaveAttribute('data-pending', 'false');
  await expect(page.getByTestId('bench-status')).toContainText('straight through-cuts');
  // Back to the saved layout: nothing to save.
  await expect(page.getByRole('button', { name: 'Save layout' })).toBeDisabled();
  await expect(page.getByRole('button', { name: 'Undo' })).toBeDisabled();
});
