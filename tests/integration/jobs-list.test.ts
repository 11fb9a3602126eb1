import { beforeAll, describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { customers, jobs, parts } from '@/db/schema';
import * as jobsRoute from '@/app/api/jobs/route';
import * as jobRoute from '@/app/api/jobs/[id]/route';
import type { JobSummary } from '@/shared/schemas/job';
import { jobMatchesSearch } from '@/lib/jobs/search';
import { request } from '../support/fixtures';
import { useTwoShopDatabase, type TwoShops } from '../support/two-shop-database';

let handle: DbHandle;
let fx: TwoShops;
useTwoShopDatabase((app) => ({ handle, fx } = app));

const noParams = { params: Promise.resolve({}) };

/** A job of our own with rows in two materials, and one with none. */
async function seedJobs() {
  const [ada, bo] = await handle.db.insert(customers).values([{ shopId: fx.mine.id, name: 'Ada Ash' }, { shopId: fx.mine.id, name: 'Bo Birch' }]).returning();
  const [withParts, empty] = await handle.db
    .insert(jobs)
    .values([
      { shopId: fx.mine.id, name: 'Counted pantry', customerId: ada.id },
      { shopId: fx.mine.id, name: 'Empty closet', customerId: bo.id },
    ])
    .returning();
  await handle.db.insert(parts).values([
    { shopId: fx.mine.id, jobId: withParts.id, label: 'Side', quantity: 4, lengthMm: 700, widthMm: 560, thicknessMm: 18, material: 'Maple ply' },
    { shopId: fx.mine.id, jobId: withParts.id, label: 'Shelf', quantity: 3, lengthMm: 560, widthMm: 300, thicknessMm: 18, material: 'Maple ply' },
    { shopId: fx.mine.id, jobId: withParts.id, label: 'Face frame', quantity: 2, lengthMm: 700, widthMm: 38, thicknessMm: 19, material: 'White oak' },
  ]);
  return { withParts, empty };
}

let seeded: Awaited<ReturnType<typeof seedJobs>>;
beforeAll(async () => {
  seeded = await seedJobs();
});

describe('the jobs list', () => {
  test('counts every part of a job (quantities summed) and names its materials once each', async () => {
    const { withParts, empty } = seeded;
    const list: JobSummary[] = await (await jobsRoute.GET(await request('/api/jobs', { user: fx.estimator }), noParams)).json();
    const counted = list.find((j) => j.id === withParts.id)!;
    // 4 + 3 + 2 pieces, by hand.
    expect(counted.partCount).toBe(9);
    expect([...counted.materials].sort()).toEqual(['Maple ply', 'White oak']);
    expect(list.find((j) => j.id === empty.id)).toMatchObject({ partCount: 0, materials: [] });

    const one: JobSummary = await (await jobRoute.GET(await request(`/api/jobs/${withParts.id}`, { user: fx.estimator }), { params: Promise.resolve({ id: withParts.id }) })).json();
    expect(one).toMatchObject({ partCount: 9 });
  });

  test('search finds a job by its name, its customer or any of its materials, ignoring case', async () => {
    const list: JobSummary[] = await (await jobsRoute.GET(await request('/api/jobs', { user: fx.estimator }), noParams)).json();
    const found = (needle: string) => list.filter((j) => jobMatchesSearch(j, needle)).map((j) => j.name).sort();
    expect(found('white oak')).toEqual(['Counted pantry']);
    expect(found('MAPLE')).toEqual(['Counted pantry']);
    expect(found('bo birch')).toEqual(['Empty closet']);
    expect(found('closet')).toEqual(['Empty closet']);
    expect(found('walnut')).toEqual([]);
  });
});
