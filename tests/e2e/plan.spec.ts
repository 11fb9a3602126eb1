import { expect, test } from './support/test';
import { dragPart, pickMove, savedPlan } from './support/bench';
import { shot, signIn } from './support/session';
import { jobId } from './support/plans';

test('an estimator nests a job with progress, saves a draft, drags a part on the bench, saves, and the change survives a reload', async ({
  page,
}) => {
  test.setTimeout(120_000);
  await signIn(page, 'estimator');
  await page.goto('/jobs?q=Hollis%20kitchen');
  await page.getByRole('link', { name: 'Hollis kitchen' }).click();
  await page.getByRole('navigation', { name: 'Job sections' }).getByRole('link', { name: 'Plan' }).click();
  await expect(page.getByRole('table', { name: 'Plans' })).toContainText('Released');
  await expect(page.getByRole('table', { name: 'Sheets' })).toBeVisible();
  await page.getByLabel('Search for (seconds)').fill('3');
  await shot(page, 'plan-nest-settings');

  await page.getByRole('button', { name: /^Nest \d+ parts?$/ }).click();
  const progress = page.getByTestId('nest-progress');
  await expect(progress).toBeVisible();
  await expect(page.getByTestId('nest-best')).toContainText('Best plan so far', { timeout: 10_000 });
  // The page stays responsive while the worker searches: typing into a field works mid-Nest.
  await page.getByLabel('Saw kerf').focus();
  await shot(page, 'plan-nest-progress');
  await expect(page.getByTestId('plan-summary')).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('plan-summary')).toContainText('Yield');
  await shot(page, 'plan-nest-result');

  await page.getByLabel('Plan name').fill('Kitchen, bench edit');
  await page.getByRole('button', { name: 'Save as draft plan' }).click();
  await expect(page.getByRole('heading', { name: /Kitchen, bench edit/ })).toBeVisible();
  await expect(page.getByTestId('bench-status')).toContainText('straight through-cuts');
  const planId = page.url().split('/').pop()!;
  await shot(page, 'plan-bench-loaded');

  const before = await savedPlan(page, planId);
  const move = pickMove(before.pieces);
  expect(move, 'the nested plan has an offcut a part fits in').not.toBeNull();
  const { part, to, piece } = move!;
  await dragPart(page, before.pieces, piece, part, to.x, to.y);
  await expect(page.getByRole('button', { name: 'Undo' })).toBeEnabled();
  await expect(page.getByTestId('bench-status')).toContainText('straight through-cuts');
  await shot(page, 'plan-bench-dragged');

  await page.getByRole('button', { name: 'Save layout' }).click();
  await expect(page.getByText('Saved. The saw order was rebuilt')).toBeVisible();
  await page.reload();
  await expect(page.getByTestId('bench-status')).toContainText('straight through-cuts');
  const after = await savedPlan(page, planId);
  const moved = after.pieces.flatMap((p) => p.placements).find((p) => p.partId === part.partId && p.instance === part.instance)!;
  expect(Math.abs(moved.x - to.x)).toBeLessThan(2);
  expect(Math.abs(moved.y - to.y)).toBeLessThan(2);
  await shot(page, 'plan-bench-after-reload');
});

test('an overlapping drop is shown on the bench and saving is refused until undone', async ({ page }) => {
  test.setTimeout(90_000);
  await signIn(page, 'estimator');
  const kitchenId = await jobId(page, 'Hollis kitchen');
  const plans: { id: string; status: string }[] = await (await page.request.get(`/api/jobs/${kitchenId}/plans`)).json();
  const draft = plans.find((p) => p.status === 'draft');
  test.skip(!draft, 'needs the draft saved by the test above');
  await page.goto(`/jobs/${kitchenId}/plan/${draft!.id}`);
  await expect(page.getByTestId('bench-status')).toContainText('straight through-cuts');
  const { pieces } = await savedPlan(page, draft!.id);
  // On the largest piece with two parts (a small offcut is drawn too small to aim at): the smaller part onto the larger.
  const i = pieces.reduce(
    (best, p, k) => (p.placements.length >= 2 && (best < 0 || p.length * p.width > pieces[best].length * pieces[best].width) ? k : best),
    -1,
  );
  const [a, b] = [...pieces[i].placements].sort((p, q) => q.w * q.h - p.w * p.h);
  // Right on top of its neighbour: no spot within snapping reach is clear, so the drop overlaps.
  const grabbed = await dragPart(page, pieces, i, b, a.x + (a.w - b.w) / 2, a.y + (a.h - b.h) / 2);
  await expect(page.getByTestId('bench-status')).toContainText('saving is refused');
  await expect(page.getByRole('list', { name: 'Problems' })).toContainText('overlap');
  await expect(page.getByRole('button', { name: 'Save layout' })).toBeDisabled();
  await shot(page, 'plan-bench-overlap');
  await page.getByTestId('bench-canvas').focus();
  await page.keyboard.press('Control+z');
  await expect(page.getByTestId('bench-status')).toContainText('straight through-cuts');

  // Lock one part and re-nest the rest around it in the worker.
  await page.mouse.click(grabbed.x, grabbed.y);
  await expect(
    page
      .getByRole('definition')
      .filter({ hasText: `#${b.instance}` })
      .first(),
  ).toBeVisible();
  await page.keyboard.press('l');
  await expect(page.getByText('1 locked.')).toBeVisible();
  await page.getByRole('button', { name: 'Re-nest unlocked' }).click();
  await expect(page.getByText('Re-nested the unlocked parts around the locked ones')).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('bench-status')).toContainText('straight through-cuts');
  await shot(page, 'plan-bench-renested');
});

test('a cutter sees the released plan on a read-only bench, without prices, drafts or the Nest', async ({ page }) => {
  await signIn(page, 'cutter');
  await page.goto('/jobs?q=Hollis%20kitchen');
  await page.getByRole('link', { name: 'Hollis kitchen' }).click();
  await page.getByRole('navigation', { name: 'Job sections' }).getByRole('link', { name: 'Plan' }).click();
  const plans = page.getByRole('table', { name: 'Plans' });
  await expect(plans).toContainText('Released');
  await expect(plans).not.toContainText('Draft');
  await expect(plans).not.toContainText('$');
  await expect(page.getByRole('heading', { name: 'Nest' })).toHaveCount(0);
  await plans.getByRole('link', { name: 'Carcasses and backs' }).click();
  await expect(page.getByTestId('bench-status')).toContainText('straight through-cuts');
  await expect(page.getByRole('button', { name: 'Save layout' })).toHaveCount(0);
  await expect(page.getByTestId('plan-summary')).not.toContainText('$');
  await expect(page.getByTestId('bench-canvas').locator('canvas').first()).toBeVisible();
  await shot(page, 'plan-cutter-readonly');
});
