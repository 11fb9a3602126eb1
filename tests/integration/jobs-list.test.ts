import { eq } from 'drizzle-orm';
import { beforeAll, describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { customers, jobs, parts } from '@/db/schema';
import * as jobsRoute from '@/app/api/jobs/route';
import * as jobRoute from '@/app/api/jobs/[id]/route';
import type { JobSummary } from '@/shared/schemas/job';
import type { JobListPage } from '@/shared/schemas/job-list';
import { request, type TestUser } from '../support/fixtures';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';

let handle: DbHandle;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ handle, fx } = app));

const noParams = { params: Promise.resolve({}) };

async function list(query: string, user: TestUser = fx.estimator): Promise<JobListPage> {
  const res = await jobsRoute.GET(await request(`/api/jobs${query}`, { user }), noParams);
  expect(res.status).toBe(200);
  return res.json();
}

/** A job of our own with rows in two materials, and one with none. */
async function seedJobs() {
  const [ada, bo] = await handle.db
    .insert(customers)
    .values([
      { shopId: fx.mine.id, name: 'Ada Ash' },
      { shopId: fx.mine.id, name: 'Bo Birch' },
    ])
    .returning();
  const [withParts, empty] = await handle.db
    .insert(jobs)
    .values([
      { shopId: fx.mine.id, name: 'Counted pantry', customerId: ada.id },
      { shopId: fx.mine.id, name: 'Empty closet', customerId: bo.id },
    ])
    .returning();
  await handle.db.insert(parts).values([
    { shopId: fx.mine.id, jobId: withParts.id, label: 'Side', quantity: 4, length: 700, width: 560, thickness: 18, material: 'Maple ply' },
    { shopId: fx.mine.id, jobId: withParts.id, label: 'Shelf', quantity: 3, length: 560, width: 300, thickness: 18, material: 'Maple ply' },
    { shopId: fx.mine.id, jobId: withParts.id, label: 'Face frame', quantity: 2, length: 700, width: 38, thickness: 19, material: 'White oak' },
  ]);
  return { withParts, empty };
}

/**
 * Five jobs tagged "Sorter" whose columns disagree on the order: names in mixed case, statuses out of work order,
 * one without a due date, one without a customer, part counts that are not the name order.
 */
async function seedSorters() {
  const [cy, di] = await handle.db
    .insert(customers)
    .values([
      { shopId: fx.mine.id, name: 'cy Cherry' },
      { shopId: fx.mine.id, name: 'Di Douglas' },
    ])
    .returning();
  const at = (day: number) => new Date(Date.UTC(2026, 10, day, 15));
  const rows = await handle.db
    .insert(jobs)
    .values([
      { shopId: fx.mine.id, name: 'Sorter bravo', status: 'done', dueDate: '2027-03-01', customerId: di.id, updatedAt: at(3) },
      { shopId: fx.mine.id, name: 'sorter alpha', status: 'accepted', dueDate: null, customerId: cy.id, updatedAt: at(5) },
      { shopId: fx.mine.id, name: 'Sorter delta', status: 'quoting', dueDate: '2027-01-15', customerId: null, updatedAt: at(1) },
      { shopId: fx.mine.id, name: 'sorter charlie', status: 'cutting', dueDate: '2027-02-01', customerId: di.id, updatedAt: at(4) },
      { shopId: fx.mine.id, name: 'Sorter echo', status: 'quoted', dueDate: '2026-12-20', customerId: cy.id, updatedAt: at(2) },
    ])
    .returning();
  const byName = Object.fromEntries(rows.map((r) => [r.name.toLowerCase().split(' ')[1], r]));
  const piece = (jobId: string, quantity: number) => ({
    shopId: fx.mine.id,
    jobId,
    label: 'Panel',
    quantity,
    length: 500,
    width: 300,
    thickness: 18,
    material: 'Birch ply',
  });
  // Pieces: alpha 2, bravo 7 (3 + 4), charlie 5, delta 0, echo 1.
  await handle.db
    .insert(parts)
    .values([piece(byName.alpha.id, 2), piece(byName.bravo.id, 3), piece(byName.bravo.id, 4), piece(byName.charlie.id, 5), piece(byName.echo.id, 1)]);
}

/** 60 jobs made in one statement, so they share one `updated_at`: only the tie-break keeps pages apart. */
async function seedMany() {
  await handle.db
    .insert(jobs)
    .values(Array.from({ length: 60 }, (_, i) => ({ shopId: fx.mine.id, name: `Batch cabinet ${String(i + 1).padStart(2, '0')}` })));
}

let seeded: Awaited<ReturnType<typeof seedJobs>>;
beforeAll(async () => {
  seeded = await seedJobs();
  await seedSorters();
  await seedMany();
});

describe('the jobs list', () => {
  test('counts every part of a job (quantities summed) and names its materials once each', async () => {
    const { withParts, empty } = seeded;
    const page = await list('?size=100');
    const counted = page.jobs.find((j) => j.id === withParts.id)!;
    // 4 + 3 + 2 pieces, by hand.
    expect(counted.partCount).toBe(9);
    expect([...counted.materials].sort()).toEqual(['Maple ply', 'White oak']);
    expect(page.jobs.find((j) => j.id === empty.id)).toMatchObject({ partCount: 0, materials: [] });

    const one: JobSummary = await (
      await jobRoute.GET(await request(`/api/jobs/${withParts.id}`, { user: fx.estimator }), { params: Promise.resolve({ id: withParts.id }) })
    ).json();
    expect(one).toMatchObject({ partCount: 9 });
  });

  test('search finds a job by its name, its customer or any of its materials, ignoring case, on the server', async () => {
    const found = async (needle: string) => (await list(`?q=${encodeURIComponent(needle)}`)).jobs.map((j) => j.name).sort();
    expect(await found('white oak')).toEqual(['Counted pantry']);
    expect(await found('MAPLE')).toEqual(['Counted pantry']);
    expect(await found('bo birch')).toEqual(['Empty closet']);
    expect(await found('closet')).toEqual(['Empty closet']);
    expect(await found('walnut')).toEqual([]);
    // The pattern's own characters are looked for as typed, not as wildcards.
    expect(await found('%')).toEqual([]);
    expect(await found('Counted_pantry')).toEqual([]);
    expect((await list('?q=walnut')).total).toBe(0);
  });

  test('the customer filter keeps one customer’s jobs (any case), and the filter’s choices are the shop’s customers with jobs', async () => {
    const page = await list('?customer=ADA%20ASH');
    expect(page.jobs.map((j) => j.name)).toEqual(['Counted pantry']);
    expect(page.customers).toEqual(expect.arrayContaining(['Ada Ash', 'Bo Birch', 'cy Cherry', 'Di Douglas']));
  });

  test('sorts on the server by every column both ways; ties never reorder between calls', async () => {
    const names = async (sort: string) => (await list(`?q=sorter&sort=${sort}`)).jobs.map((j) => j.name.toLowerCase().split(' ')[1]);
    // Orders worked out by hand from seedSorters.
    expect(await names('name.asc')).toEqual(['alpha', 'bravo', 'charlie', 'delta', 'echo']);
    expect(await names('name.desc')).toEqual(['echo', 'delta', 'charlie', 'bravo', 'alpha']);
    // Work order: quoting, quoted, won, cutting, done.
    expect(await names('status.asc')).toEqual(['delta', 'echo', 'alpha', 'charlie', 'bravo']);
    expect(await names('status.desc')).toEqual(['bravo', 'charlie', 'alpha', 'echo', 'delta']);
    // No due date goes last both ways.
    expect(await names('due.asc')).toEqual(['echo', 'delta', 'charlie', 'bravo', 'alpha']);
    expect(await names('due.desc')).toEqual(['bravo', 'charlie', 'delta', 'echo', 'alpha']);
    // Pieces 0, 1, 2, 5, 7.
    expect(await names('parts.asc')).toEqual(['delta', 'echo', 'alpha', 'charlie', 'bravo']);
    expect(await names('parts.desc')).toEqual(['bravo', 'charlie', 'alpha', 'echo', 'delta']);
    // Customers ignoring case (cy Cherry before Di Douglas), the job without one last.
    expect((await names('customer.asc')).slice(0, 2).sort()).toEqual(['alpha', 'echo']);
    expect((await names('customer.asc')).slice(2, 4).sort()).toEqual(['bravo', 'charlie']);
    expect((await names('customer.asc'))[4]).toBe('delta');
    expect((await names('customer.desc'))[4]).toBe('delta');
    // The default: latest change first.
    expect(await names('updated.desc')).toEqual(['alpha', 'charlie', 'bravo', 'echo', 'delta']);
    expect(await names('')).toEqual(await names('updated.desc'));
    expect(await names('updated.asc')).toEqual(['delta', 'echo', 'bravo', 'charlie', 'alpha']);
    expect(await names('customer.asc')).toEqual(await names('customer.asc'));
  });

  test('pages: 60 jobs at 25 a page are 25 + 25 + 10, each exactly once, and a page past the end is empty with the count', async () => {
    const pages = await Promise.all([1, 2, 3].map((p) => list(`?q=batch%20cabinet&page=${p}`)));
    expect(pages.map((p) => p.jobs.length)).toEqual([25, 25, 10]);
    expect(pages.map((p) => [p.page, p.pageSize, p.total, p.pageCount])).toEqual([
      [1, 25, 60, 3],
      [2, 25, 60, 3],
      [3, 25, 60, 3],
    ]);
    const ids = pages.flatMap((p) => p.jobs.map((j) => j.id));
    expect(new Set(ids).size).toBe(60);
    expect(pages.flatMap((p) => p.jobs.map((j) => j.name)).sort()).toEqual(
      Array.from({ length: 60 }, (_, i) => `Batch cabinet ${String(i + 1).padStart(2, '0')}`),
    );
    const past = await list('?q=batch%20cabinet&page=4');
    expect(past).toMatchObject({ jobs: [], total: 60, page: 4, pageCount: 3 });
    const big = await list('?q=batch%20cabinet&size=50&page=2&sort=name.asc');
    expect(big.jobs.map((j) => j.name)).toEqual(Array.from({ length: 10 }, (_, i) => `Batch cabinet ${i + 51}`));
    expect((await list('?q=batch%20cabinet&size=100')).jobs).toHaveLength(60);
  });

  test('a bad page, page size or sort is a 422 naming the field, and a blank one means the default', async () => {
    for (const [query, field, message] of [
      ['?page=0', 'page', 'The page is a whole number, 1 or more.'],
      ['?page=-2', 'page', 'The page is a whole number, 1 or more.'],
      ['?page=1.5', 'page', 'The page is a whole number, 1 or more.'],
      ['?page=two', 'page', 'The page is a whole number, 1 or more.'],
      ['?page=9999999', 'page', 'The page is at most 100,000.'],
      ['?size=30', 'size', 'A page holds 25, 50 or 100 jobs.'],
      ['?sort=price.asc', 'sort', 'Sort by name, customer, status, due, parts, updated, each .asc or .desc (say updated.desc).'],
      ['?status=lost', 'status', 'Status is one of quoting, quoted, accepted, deposit-paid, cutting, done, declined, expired, archived or all.'],
    ]) {
      const res = await jobsRoute.GET(await request(`/api/jobs${query}`, { user: fx.estimator }), noParams);
      expect(res.status, query).toBe(422);
      expect((await res.json()).fields, query).toEqual({ [field]: [message] });
    }
    expect(await list('?page=&size=&sort=')).toMatchObject({ page: 1, pageSize: 25, sort: 'updated.desc' });
  });

  test('another shop’s jobs and customers appear on no page, in no count and in no search', async () => {
    const all = await list('?status=all&size=100&page=1');
    const rest = await list('?status=all&size=100&page=2');
    const names = [...all.jobs, ...rest.jobs].map((j) => j.name);
    expect(names).toContain('Birchwood pantry');
    expect(names).not.toContain('Elm Street library');
    expect(all.total).toBe(names.length);
    expect(all.shopJobs).toBe(names.length);
    expect((await list('?q=elm%20street&status=all')).total).toBe(0);

    const theirs = await list('?status=all&size=100', fx.otherOwner);
    expect(theirs.jobs.map((j) => j.name)).toEqual(['Elm Street library']);
    expect(theirs).toMatchObject({ total: 1, shopJobs: 1, archived: 0 });
    expect(theirs.customers).not.toContain('Ada Ash');
    expect((await list('?q=maple', fx.otherOwner)).total).toBe(0);
  });
});

describe("a job's pieces and materials, kept on the job by the trigger on parts", () => {
  /** The figures counted from the parts themselves, to hold the kept ones against. */
  async function counted(jobId: string) {
    const rows = await handle.db.select({ quantity: parts.quantity, material: parts.material }).from(parts).where(eq(parts.jobId, jobId));
    return { partCount: rows.reduce((n, r) => n + r.quantity, 0), materials: [...new Set(rows.map((r) => r.material))].sort() };
  }
  async function listed(name: string) {
    const page = await list(`?q=${encodeURIComponent(name)}&status=all`);
    const job = page.jobs.find((j) => j.name === name)!;
    return { partCount: job.partCount, materials: job.materials };
  }

  test('follow every insert, change, move and delete of a part, in the statement that makes it', async () => {
    const [a, b] = await handle.db
      .insert(jobs)
      .values([
        { shopId: fx.mine.id, name: 'Kept figures hutch' },
        { shopId: fx.mine.id, name: 'Kept figures bench' },
      ])
      .returning();
    expect(await listed(a.name)).toEqual({ partCount: 0, materials: [] });
    const [side, top] = await handle.db
      .insert(parts)
      .values([
        { shopId: fx.mine.id, jobId: a.id, label: 'Side', quantity: 2, length: 900, width: 400, thickness: 18, material: 'Walnut ply' },
        { shopId: fx.mine.id, jobId: a.id, label: 'Top', quantity: 1, length: 1200, width: 420, thickness: 25, material: 'White oak' },
        { shopId: fx.mine.id, jobId: a.id, label: 'Shelf', quantity: 3, length: 1150, width: 380, thickness: 18, material: 'Walnut ply' },
      ])
      .returning();
    expect(await listed(a.name)).toEqual({ partCount: 6, materials: ['Walnut ply', 'White oak'] });
    expect(await listed(a.name)).toEqual(await counted(a.id));

    await handle.db.update(parts).set({ quantity: 5, material: 'Cherry' }).where(eq(parts.id, side.id));
    expect(await listed(a.name)).toEqual({ partCount: 9, materials: ['Cherry', 'Walnut ply', 'White oak'] });

    // Moved to the other job: both jobs' figures change.
    await handle.db.update(parts).set({ jobId: b.id }).where(eq(parts.id, top.id));
    expect(await listed(a.name)).toEqual({ partCount: 8, materials: ['Cherry', 'Walnut ply'] });
    expect(await listed(b.name)).toEqual({ partCount: 1, materials: ['White oak'] });

    await handle.db.delete(parts).where(eq(parts.jobId, a.id));
    expect(await listed(a.name)).toEqual({ partCount: 0, materials: [] });
    expect(await listed(b.name)).toEqual(await counted(b.id));

    // A rolled-back insert leaves the figures as they were.
    await handle.db
      .transaction(async (tx) => {
        await tx
          .insert(parts)
          .values({ shopId: fx.mine.id, jobId: b.id, label: 'Leg', quantity: 4, length: 450, width: 45, thickness: 45, material: 'Ash' });
        tx.rollback();
      })
      .catch(() => undefined);
    expect(await listed(b.name)).toEqual({ partCount: 1, materials: ['White oak'] });
  });
});
