import { expect, test, type Page } from './support/test';
import { shot, signIn } from './support/session';

/** A job of this spec's own, so the seeded jobs other specs count on stay as they were. */
async function freshJob(page: Page, name: string) {
  const res = await page.request.post('/api/jobs', { data: { name: `${name} ${Date.now().toString(36)}` } });
  expect(res.status()).toBe(201);
  return (await res.json()) as { id: string };
}

async function newSchedule(page: Page, jobId: string, label: string, opening: [string, string, string]) {
  await page.goto(`/jobs/${jobId}/drawers`);
  await page.getByRole('button', { name: 'New drawer schedule' }).click();
  await page.getByLabel('Label').fill(label);
  await page.getByLabel('Opening width').fill(opening[0]);
  await page.getByLabel('Opening height').fill(opening[1]);
  await page.getByLabel('Opening depth').fill(opening[2]);
  await page.getByLabel('Opening depth').blur();
  await expect(page.getByRole('table', { name: 'Parts of this schedule' })).toBeVisible();
}

test('the owner keeps the shop’s slide models in Shop settings: the demo’s two, one added, changed and deleted', async ({ page }) => {
  await signIn(page, 'owner');
  await page.goto('/settings');
  const list = page.getByRole('list', { name: 'Slide models' });
  // The demo's invented models, their maker-style rules shown as given (10 mm stays 10 mm in an inch shop).
  await expect(list.getByRole('listitem').filter({ hasText: 'Halbrook UM-58 full extension' })).toContainText('Inside width = opening − 1-5/8″');
  await expect(list.getByRole('listitem').filter({ hasText: 'Tessel T-16 soft close' })).toContainText('Box width = opening − 10 mm');
  await shot(page, 'slide-models-01-settings');

  const name = `Spec slide ${Date.now().toString(36)}`;
  await page.getByRole('button', { name: 'Add a slide model' }).click();
  const form = page.getByRole('form', { name: 'New slide model' });
  await form.getByLabel('Name').fill(name);
  await form.getByLabel('Lengths it is made in (inches)').fill('12,15,18');
  await form.getByLabel('Width rule').selectOption('outside');
  await form.getByLabel('Width deduction').fill('1/2');
  await form.getByLabel('Thickest side it takes').fill('5/8');
  await form.getByLabel('Bottom recess').fill('1/2');
  await form.getByLabel('Height clearance').fill('1');
  await form.getByLabel('Rear clearance').fill('1/2');
  await form.getByRole('button', { name: 'Add the slide model' }).click();
  // "12,15" could be twelve thousand: the form says how to separate lengths.
  await expect(form.getByText(/Separate lengths with a comma and a space, or a semicolon/)).toBeVisible();
  await form.getByLabel('Lengths it is made in (inches)').fill('18, 12, 15');
  await form.getByRole('button', { name: 'Add the slide model' }).click();
  const added = list.getByRole('listitem').filter({ hasText: name });
  await expect(added).toContainText('Box width = opening − 1/2″');
  await expect(added).toContainText('12″, 15″, 18″ · 1/2″ behind');

  await added.getByRole('button', { name: `Edit ${name}` }).click();
  await page
    .getByRole('form', { name: `Edit ${name}` })
    .getByLabel('Width deduction')
    .fill('3/4');
  await page.getByRole('button', { name: 'Save changes' }).click();
  await expect(added).toContainText('Box width = opening − 3/4″');
  await page.setViewportSize({ width: 390, height: 844 });
  await shot(page, 'slide-models-02-settings-phone');
  await page.setViewportSize({ width: 1440, height: 900 });

  page.once('dialog', (d) => d.accept());
  await added.getByRole('button', { name: `Delete ${name}` }).click();
  await expect(added).toHaveCount(0);
});

test('an estimator sizes drawers on an undermount model with a lipped front, and on metric side-mount slides', async ({ page }) => {
  await signIn(page, 'estimator');
  const job = await freshJob(page, 'Slide models');
  await newSchedule(page, job.id, 'Vanity drawers', ['15', '7', '22']);

  await page.getByLabel('Slides', { exact: true }).selectOption('undermount');
  // Undermount boxes are sized by a model: the shop's first is chosen, its rule said, the box as long as its slide.
  await expect(page.getByLabel('Slide model')).toHaveValue(/.+/);
  await expect(page.getByLabel('Slide model').locator('option:checked')).toHaveText('Halbrook UM-58 full extension');
  const notes = page.getByText(/inside 13-3\/8″ = opening 15″ − 1-5\/8″ \(the Halbrook UM-58 full extension's inside-width rule\)/);
  await expect(notes).toBeVisible();
  await expect(page.getByText(/Box 21″ long, as long as its slide/)).toBeVisible();

  // A lipped front laps the opening ⅜″ each side by default, and the preview shows it against the opening.
  await page.getByLabel('Box front').selectOption('lipped');
  const face = page.getByRole('figure', { name: 'The drawer’s front against its opening' });
  await expect(face).toContainText('Lipped front15-3/4″');
  await expect(face).toContainText('Opening15″ × 7″');
  await expect(face).toContainText('Laps the opening 3/8″ each side.');
  await shot(page, 'slide-models-03-undermount-lipped');

  // A reveal too small to clear the opening is warned.
  await page.getByLabel('Lipped front meets the opening').selectOption('reveal');
  await page.getByLabel('Reveal each side').fill('0.5 mm');
  await page.getByLabel('Reveal each side').blur();
  await expect(page.getByText(/leaves only 0\.5 mm each side of the 15″ opening: it will rub or bind/)).toBeVisible();
  await page.getByLabel('Reveal each side').fill('');
  await page.getByLabel('Lipped front meets the opening').selectOption('overlay');

  // Sides thicker than a model takes are refused on the side thickness.
  await page.getByLabel('Slide model').selectOption({ label: 'Tessel T-16 soft close' });
  await page.getByLabel('Side thickness').selectOption({ label: '3/4″ sheet · 18 mm actual' });
  await expect(
    page.getByText('The Tessel T-16 soft close takes sides up to 16 mm; these are 18 mm: use thinner sides or another slide').first(),
  ).toBeVisible();
  await page.getByLabel('Side thickness').selectOption({ label: '1/2″ sheet · 12 mm actual' });
  await page.getByLabel('Slide model').selectOption({ label: 'Halbrook UM-58 full extension' });

  await page.getByRole('button', { name: 'Add to the cut list' }).click();
  const saved = page.locator('li', { hasText: 'Vanity drawers' });
  await expect(saved).toContainText('4 rows in the cut list');
  await saved.getByRole('button', { name: 'Edit Vanity drawers' }).click();
  await expect(page.getByLabel('Slides', { exact: true })).toHaveValue('undermount');
  await expect(page.getByLabel('Slide model').locator('option:checked')).toHaveText('Halbrook UM-58 full extension');
  await expect(page.getByLabel('Overlay each side')).toHaveValue('3/8″');
  await page.getByRole('button', { name: 'Cancel' }).click();

  // Metric side-mount slides in this inch shop: 12.5 mm a side and the metric lengths.
  await newSchedule(page, job.id, 'Euro slides', ['564 mm', '200 mm', '560 mm']);
  await page.getByLabel('Slide series').selectOption('metric');
  await expect(page.getByText(/− 2 × 12\.5 mm metric side-mount slide clearance/)).toBeVisible();
  await expect(page.getByText(/longest standard metric slide that fits the opening \(250 mm–650 mm\)/)).toBeVisible();
});

test('a metric shop’s drawer schedule starts on metric slides: a 564 mm opening takes a 539 mm box on a 500 mm slide', async ({ page }) => {
  await signIn(page, 'owner');
  const before = await (await page.request.get('/api/settings')).json();
  expect((await page.request.patch('/api/settings', { data: { units: { system: 'metric', precision: 1, feet: false } } })).status()).toBe(200);
  try {
    const job = await freshJob(page, 'Metric drawers');
    await newSchedule(page, job.id, 'Base drawers', ['564', '200', '560']);
    await expect(page.getByLabel('Slide series')).toHaveValue('metric');
    await expect(page.getByText('Box 539 mm wide = opening 564 mm − 2 × 12.5 mm metric side-mount slide clearance.')).toBeVisible();
    await expect(page.getByText('Box 500 mm deep to suit the longest standard metric slide that fits the opening (250 mm–650 mm).')).toBeVisible();
    await expect(
      page
        .getByRole('img', { name: 'Box 539 mm wide, 187.5 mm high, 500 mm deep' })
        .or(page.getByRole('img', { name: /^Box 539 mm wide, ≈188 mm high, 500 mm deep$/ })),
    ).toBeVisible();
    await shot(page, 'slide-models-04-metric-shop');
    await page.setViewportSize({ width: 390, height: 844 });
    await shot(page, 'slide-models-05-metric-shop-phone');
  } finally {
    await page.request.patch('/api/settings', { data: { units: before.units } });
  }
});
