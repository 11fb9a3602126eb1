import { and, eq } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import type { Db } from '@/db/open';
import { offcuts, plans, recuts } from '@/db/schema';
import { listYieldLedger } from '@/db/queries/stock-yield';
import * as jobPlans from '@/app/api/jobs/[id]/plans/route';
import * as nestRequestRoute from '@/app/api/jobs/[id]/nest-request/route';
import type { JobPlanSummary } from '@/db/queries/plan-drafts';
import { getPartPage } from '@/db/queries/part-page';
import { partTagPath } from '@/lib/saw-order/part-tags';
import type { NestRequestInput } from '@/shared/schemas/nesting';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { call, cancel, cancelRecut, counts, finish, firstPart, jobStatus, jobWithSheet, nestAndSave, recutList, release } from '../support/shop-day';

let db: Db;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ db, fx } = app));

// A base cabinet's carcass parts: the sides leave a large offcut on the sheet, big enough for a side again.
const carcass = [
  { label: 'Side', quantity: 2, length: 720, width: 560 },
  { label: 'Shelf', quantity: 3, length: 560, width: 300, grain: 'any' as const },
];

/** A accepted job whose first plan was cut with one part damaged: the plan, the damaged part, the job and its sheet. */
async function cutWithOneDamaged(reason = 'Tear-out') {
  const { job, sheet, material } = await jobWithSheet(db, fx.mine.id, { parts: carcass, onHand: 4, status: 'accepted', acceptedAt: new Date() });
  const first = await nestAndSave(fx.estimator, job.id, { name: 'Carcass' });
  await release(fx.estimator, first.id);
  const damaged = firstPart(first.plan);
  const done = await finish(fx.cutter, first.id, {
    offcuts: [],
    damaged: [{ piece: damaged.piece, partId: damaged.partId, instance: damaged.instance, reason }],
  });
  expect(done.status).toBe(200);
  return { job, sheet, material, first, damaged, done: done.body };
}

const nestRequestFor = (user: typeof fx.owner, jobId: string) =>
  call<NestRequestInput>(nestRequestRoute.GET, `/api/jobs/${jobId}/nest-request?for=recuts`, jobId, user);

describe('a part damaged at the saw', () => {
  test('goes on its job’s re-cut list with quantity, reason, size, material, thickness, grain and "#n"; the job stays cutting', async () => {
    const { job, first, damaged, done, material } = await cutWithOneDamaged();
    expect(done).toMatchObject({ damaged: 1, recutsAdded: 1, jobStatus: 'cutting' });
    const part = first.request.parts.find((p) => p.id === damaged.partId)!;
    const list = await recutList(fx.cutter, job.id);
    expect(list.status).toBe(200);
    expect(list.body).toEqual([
      expect.objectContaining({
        label: part.label,
        instance: damaged.instance,
        quantity: 1,
        length: part.length,
        width: part.width,
        thickness: 18,
        material,
        grain: part.grain,
        reason: 'Tear-out',
        status: 'open',
        sourcePlan: { id: first.id, name: 'Carcass' },
        createdBy: 'Cato Birch',
      }),
    ]);
    expect(await jobStatus(fx.cutter, job.id)).toBe('cutting');
  });

  test('a damaged part given no reason is recorded as damaged at the saw', async () => {
    const { job } = await cutWithOneDamaged('');
    expect((await recutList(fx.estimator, job.id)).body[0].reason).toBe('Damaged at the saw');
  });

  test('counts as waste in the yield ledger, shown apart from the saw’s own waste', async () => {
    const { first, damaged } = await cutWithOneDamaged();
    const ledger = await listYieldLedger({ db, shopId: fx.mine.id });
    const row = ledger.plans.find((p) => p.id === first.id)!;
    const stockArea = first.plan.totals!.stockArea;
    const spoiled = damaged.w * damaged.h;
    expect(row.spoiledRatio).toBeCloseTo(spoiled / stockArea, 9);
    expect(row.yieldRatio).toBeCloseTo((first.plan.totals!.partArea - spoiled) / stockArea, 9);
    expect(row.sawWasteRatio! + row.spoiledRatio).toBeCloseTo(row.wasteRatio!, 9);
    expect(row.sawWasteRatio).toBeGreaterThan(0);
  });

  test('the same part named twice as damaged is refused and nothing is recorded', async () => {
    const { job } = await jobWithSheet(db, fx.mine.id, { parts: carcass, status: 'accepted', acceptedAt: new Date() });
    const p = await nestAndSave(fx.estimator, job.id);
    await release(fx.estimator, p.id);
    const d = firstPart(p.plan);
    const twice = await finish(fx.cutter, p.id, { damaged: [d, d].map(({ piece, partId, instance }) => ({ piece, partId, instance })) });
    expect(twice.status).toBe(422);
    expect((await recutList(fx.estimator, job.id)).body).toEqual([]);
    expect((await db.select().from(plans).where(eq(plans.id, p.id)))[0].status).toBe('released');
  });
});

describe('nesting and cutting the re-cuts', () => {
  test('the nest request holds only the open re-cuts; the plan uses an offcut first, records it is a re-cut plan, and closes them when done', async () => {
    const { job, sheet, damaged, first } = await cutWithOneDamaged();
    const [recut] = (await recutList(fx.estimator, job.id)).body;
    const offered = await nestRequestFor(fx.estimator, job.id);
    expect(offered.body.parts).toEqual([
      expect.objectContaining({
        id: recut.id,
        label: `${recut.label} #${recut.instance} · re-cut`,
        quantity: 1,
        length: recut.length,
        width: recut.width,
        thickness: 18,
      }),
    ]);
    // The first plan put its offcuts on the rack; one of them takes a side.
    const rack = await db
      .select()
      .from(offcuts)
      .where(and(eq(offcuts.sourcePlanId, first.id), eq(offcuts.status, 'available')));
    expect(rack.some((o) => o.length >= damaged.w && o.width >= damaged.h)).toBe(true);

    const sheetsBefore = await counts(db, sheet.id);
    const again = await nestAndSave(fx.estimator, job.id, { for: 'recuts', name: 'Re-cuts' });
    expect(again.plan.unplaced).toEqual([]);
    expect(again.plan.pieces.map((p) => p.kind)).toEqual(['offcut']);
    const listed: JobPlanSummary[] = (await call(jobPlans.GET, `/api/jobs/${job.id}/plans`, job.id, fx.estimator)).body;
    expect(listed.find((p) => p.id === again.id)).toMatchObject({ recutPlan: true, status: 'draft' });
    expect(listed.find((p) => p.id === first.id)).toMatchObject({ recutPlan: false });

    expect((await release(fx.estimator, again.id)).status).toBe(200);
    expect((await recutList(fx.cutter, job.id)).body[0]).toMatchObject({ status: 'planned', recutPlan: { id: again.id, name: 'Re-cuts' } });
    expect((await nestRequestFor(fx.estimator, job.id)).body.parts).toEqual([]);
    expect(await jobStatus(fx.estimator, job.id)).toBe('cutting');

    const done = await finish(fx.cutter, again.id);
    expect(done.body).toMatchObject({ recutsClosed: 1, recutsAdded: 0, jobStatus: 'done' });
    expect((await recutList(fx.cutter, job.id)).body[0]).toMatchObject({ status: 'cut', closedBy: 'Cato Birch', closedAt: expect.any(String) });
    expect(await jobStatus(fx.cutter, job.id)).toBe('done');
    // Cut from the offcut: no sheet moved.
    expect(await counts(db, sheet.id)).toEqual(sheetsBefore);
  });

  test('a part tag of the re-cut plan leads to the re-cut: its size, what it re-cuts, and where it is cut from', async () => {
    const { job } = await cutWithOneDamaged();
    const again = await nestAndSave(fx.estimator, job.id, { for: 'recuts' });
    await release(fx.estimator, again.id);
    const [recut] = (await recutList(fx.cutter, job.id)).body;
    const placed = firstPart(again.plan);
    expect(partTagPath(again.id, placed)).toBe(`/parts/${recut.id}?plan=${again.id}&instance=1`);
    const page = await getPartPage({ db, shopId: fx.mine.id }, recut.id, { drafts: false });
    expect(page).toMatchObject({
      recutOf: `${recut.label} #${recut.instance}`,
      part: { length: recut.length, width: recut.width, material: recut.material },
    });
    expect(page!.plans.find((p) => p.id === again.id)!.places).toEqual([expect.objectContaining({ pieceIndex: 0, instance: 1 })]);
  });

  test('with no offcut that fits, the re-cut is nested on a sheet', async () => {
    const { job, sheet, first } = await cutWithOneDamaged();
    await db.update(offcuts).set({ status: 'scrapped' }).where(eq(offcuts.sourcePlanId, first.id));
    const again = await nestAndSave(fx.estimator, job.id, { for: 'recuts' });
    expect(again.plan.unplaced).toEqual([]);
    expect(again.plan.pieces.map((p) => p.stockId)).toEqual([`stock:${sheet.id}`]);
  });

  test('cancelling a released re-cut plan puts its re-cuts back on the list to nest again', async () => {
    const { job } = await cutWithOneDamaged();
    const again = await nestAndSave(fx.estimator, job.id, { for: 'recuts' });
    await release(fx.estimator, again.id);
    const cancelled = await cancel(fx.estimator, again.id);
    expect(cancelled.body.jobStatus).toBe('cutting');
    expect((await recutList(fx.estimator, job.id)).body[0]).toMatchObject({ status: 'open', recutPlan: null });
    expect((await nestRequestFor(fx.estimator, job.id)).body.parts).toHaveLength(1);
  });

  test('a re-cut damaged again is marked so and a new one takes its place; the job is not done', async () => {
    const { job } = await cutWithOneDamaged();
    const again = await nestAndSave(fx.estimator, job.id, { for: 'recuts' });
    await release(fx.estimator, again.id);
    const d = firstPart(again.plan);
    const done = await finish(fx.cutter, again.id, {
      damaged: [{ ...d, reason: 'Chipped edge' }].map(({ piece, partId, instance, reason }) => ({ piece, partId, instance, reason })),
    });
    expect(done.body).toMatchObject({ recutsAdded: 1, recutsClosed: 0, jobStatus: 'cutting' });
    const list = (await recutList(fx.estimator, job.id)).body;
    expect(list.map((r) => [r.status, r.reason])).toEqual([
      ['open', 'Chipped edge'],
      ['spoiled', 'Tear-out'],
    ]);
    expect(list[0]).toMatchObject({ label: list[1].label, instance: list[1].instance, length: list[1].length, sourcePlan: { id: again.id } });
  });

  test('a re-cut plan whose re-cut was cancelled since the Nest is refused at release, naming it, and reserves nothing', async () => {
    const { job, first } = await cutWithOneDamaged();
    const again = await nestAndSave(fx.estimator, job.id, { for: 'recuts' });
    const [recut] = (await recutList(fx.estimator, job.id)).body;
    await cancelRecut(fx.estimator, recut.id, 'Made from a scrap at the bench');
    const refused = await release(fx.estimator, again.id);
    expect(refused.status).toBe(409);
    expect(refused.body.error).toBe(`${recut.label} #${recut.instance} (cancelled) is no longer open. Nothing was released; nest the re-cuts again.`);
    expect((await db.select().from(offcuts).where(eq(offcuts.sourcePlanId, first.id))).every((o) => o.status === 'available')).toBe(true);
    expect((await db.select().from(plans).where(eq(plans.id, again.id)))[0].status).toBe('draft');
  });

  test('saving a Nest of re-cuts when none is open is refused', async () => {
    const { job } = await jobWithSheet(db, fx.mine.id, { parts: carcass });
    const sheetIds = (
      await call<NestRequestInput>(nestRequestRoute.GET, `/api/jobs/${job.id}/nest-request?for=recuts`, job.id, fx.estimator)
    ).body.stock.map((s) => s.id);
    const res = await call(jobPlans.POST, `/api/jobs/${job.id}/plans`, job.id, fx.estimator, {
      method: 'POST',
      body: { name: 'Nothing', stockIds: sheetIds, for: 'recuts', plan: { version: 1, pieces: [], unplaced: [] } },
    });
    expect(res.status).toBe(409);
    expect(res.body.error).toBe('This job has no open re-cuts to nest; nothing was saved.');
  });
});

describe('cancelling a re-cut', () => {
  test('the estimator takes an open re-cut off the list with a reason; a job whose plans are all done is then done', async () => {
    const { job } = await cutWithOneDamaged();
    const [recut] = (await recutList(fx.estimator, job.id)).body;
    const noReason = await cancelRecut(fx.estimator, recut.id, ' ');
    expect(noReason.status).toBe(422);
    expect(noReason.body.fields.reason).toEqual(['Say why this re-cut is not needed (made from scrap, customer changed it…).']);
    const ok = await cancelRecut(fx.estimator, recut.id, 'Customer dropped the cabinet');
    expect(ok.body).toMatchObject({ status: 'cancelled', jobStatus: 'done' });
    expect((await recutList(fx.cutter, job.id)).body[0]).toMatchObject({
      status: 'cancelled',
      cancelReason: 'Customer dropped the cabinet',
      closedBy: 'Esme Birch',
    });
    expect((await cancelRecut(fx.owner, recut.id, 'Twice')).status).toBe(409);
  });

  test('one held by a released re-cut plan is refused: cancel that plan first', async () => {
    const { job } = await cutWithOneDamaged();
    const again = await nestAndSave(fx.estimator, job.id, { for: 'recuts', name: 'Re-cut run' });
    await release(fx.estimator, again.id);
    const [recut] = (await recutList(fx.estimator, job.id)).body;
    const refused = await cancelRecut(fx.owner, recut.id, 'Not needed');
    expect(refused.status).toBe(409);
    expect(refused.body.error).toBe('This re-cut is in the released plan “Re-cut run”: cancel that plan first, or finish it.');
  });
});

describe('who may do what with re-cuts', () => {
  test('the cutter records damaged parts and reads the list, but cannot nest, release or cancel re-cuts', async () => {
    const { job } = await cutWithOneDamaged();
    const [recut] = (await recutList(fx.cutter, job.id)).body;
    expect((await nestRequestFor(fx.cutter, job.id)).status).toBe(403);
    const save = await call(jobPlans.POST, `/api/jobs/${job.id}/plans`, job.id, fx.cutter, {
      method: 'POST',
      body: { stockIds: ['x'], for: 'recuts', plan: {} },
    });
    expect(save.status).toBe(403);
    const again = await nestAndSave(fx.estimator, job.id, { for: 'recuts' });
    expect((await release(fx.cutter, again.id)).status).toBe(403);
    expect((await cancelRecut(fx.cutter, recut.id, 'Mine now')).status).toBe(403);
    expect((await db.select().from(recuts).where(eq(recuts.id, recut.id)))[0].status).toBe('open');
  });

  test('another shop’s owner sees no re-cut list and cannot cancel one', async () => {
    const { job } = await cutWithOneDamaged();
    const [recut] = (await recutList(fx.estimator, job.id)).body;
    expect((await recutList(fx.otherOwner, job.id)).status).toBe(404);
    expect((await cancelRecut(fx.otherOwner, recut.id, 'Not mine')).status).toBe(404);
  });

  test('the cutter’s finish answer carries no prices', async () => {
    const { done } = await cutWithOneDamaged();
    expect(done).toMatchObject({ recutsAdded: 1 });
    expect(JSON.stringify(done)).not.toMatch(/cost/i);
  });
});
