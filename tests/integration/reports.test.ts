/**
 * The owner's reports against figures worked by hand from the rows seeded here. Areas in mm²; dates read in
 * Chicago (US Central: UTC−6 in winter, UTC−5 in summer, tz database America/Chicago).
 */
import { beforeAll, describe, expect, test } from 'vitest';
import type { Db } from '@/db/open';
import { customers, offcuts, placements, planPieces, plans, stockItems, stockMovements } from '@/db/schema';
import { offcutUse, oldOffcuts, reportMaterials, stockValueReport, yieldOverTime, type ReportFilter } from '@/db/queries/reports';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';

let db: Db;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ db, fx } = app));

const ZONE = 'America/Chicago';

async function plan(
  shopId: string,
  jobId: string,
  status: 'done' | 'cutting',
  finishedAt: string | null,
  pieces: { material: string; thickness: number; l: number; w: number; offcutId?: string; parts: { l: number; w: number; damaged?: boolean }[] }[],
) {
  const [p] = await db
    .insert(plans)
    .values({ shopId, jobId, name: `Plan ${finishedAt}`, status, request: {}, document: {}, finishedAt: finishedAt ? new Date(finishedAt) : null })
    .returning();
  for (const [index, piece] of pieces.entries()) {
    const [row] = await db
      .insert(planPieces)
      .values({
        shopId,
        planId: p.id,
        index,
        material: piece.material,
        thickness: piece.thickness,
        length: piece.l,
        width: piece.w,
        offcutId: piece.offcutId ?? null,
      })
      .returning();
    if (piece.parts.length) {
      await db.insert(placements).values(
        piece.parts.map((part, i) => ({
          shopId,
          planPieceId: row.id,
          instance: i + 1,
          x: 0,
          y: 0,
          length: part.l,
          width: part.w,
          damaged: part.damaged ?? false,
        })),
      );
    }
  }
  return p;
}

async function offcut(values: Partial<typeof offcuts.$inferInsert> & { createdAt: Date; length: number; width: number }) {
  const [o] = await db
    .insert(offcuts)
    .values({ shopId: fx.mine.id, material: 'Birch ply', thickness: 18, ...values })
    .returning();
  return o;
}

const filter = (over: Partial<ReportFilter> = {}): ReportFilter => ({
  shopId: fx.mine.id,
  timeZone: ZONE,
  by: 'month',
  from: '2026-11-01',
  to: '2026-12-31',
  ...over,
});

beforeAll(async () => {
  // An offcut racked in May, cut up by plan B in December.
  const used = await offcut({ length: 1000, width: 500, status: 'used', createdAt: new Date('2026-05-01T15:00:00Z') });
  // Plan A, finished Sunday 29 November at 23:30 in Chicago (05:30 UTC on Monday 30 November).
  const a = await plan(fx.mine.id, fx.myJob.id, 'done', '2026-11-30T05:30:00Z', [
    {
      material: 'Birch ply',
      thickness: 18,
      l: 2000,
      w: 1000,
      parts: [
        { l: 1000, w: 800 },
        { l: 500, w: 400, damaged: true },
      ],
    },
  ]);
  await offcut({ length: 900, width: 500, sourcePlanId: a.id, createdAt: new Date('2026-11-30T05:31:00Z') });
  // Plan B, Tuesday 1 December at noon in Chicago: the May offcut and an MDF sheet.
  const b = await plan(fx.mine.id, fx.myJob.id, 'done', '2026-12-01T18:00:00Z', [
    { material: 'Birch ply', thickness: 18, l: 1000, w: 500, offcutId: used.id, parts: [{ l: 900, w: 450 }] },
    { material: 'MDF', thickness: 12, l: 1000, w: 1000, parts: [{ l: 600, w: 500 }] },
  ]);
  await db
    .insert(stockMovements)
    .values({ shopId: fx.mine.id, kind: 'consumed', offcutId: used.id, quantity: -1, planId: b.id, createdAt: new Date('2026-12-01T18:00:00Z') });
  // A scrap thrown out at 21:00 on 1 December in Chicago (03:00 UTC on the 2nd).
  const scrap = await offcut({ length: 300, width: 200, status: 'scrapped', createdAt: new Date('2026-06-01T12:00:00Z') });
  await db
    .insert(stockMovements)
    .values({ shopId: fx.mine.id, kind: 'scrapped', offcutId: scrap.id, quantity: -1, createdAt: new Date('2026-12-02T03:00:00Z') });
  // Still on the rack since March: older than six months on 3 December.
  await offcut({ length: 700, width: 300, location: 'Bin 3', createdAt: new Date('2026-03-15T16:00:00Z') });
  // Not counted: a plan still being cut, and another shop's finished plan.
  await plan(fx.mine.id, fx.myJob.id, 'cutting', null, [{ material: 'Birch ply', thickness: 18, l: 2000, w: 1000, parts: [{ l: 1000, w: 1000 }] }]);
  await plan(fx.theirs.id, fx.theirJob.id, 'done', '2026-11-15T18:00:00Z', [
    { material: 'Birch ply', thickness: 18, l: 2440, w: 1220, parts: [{ l: 1000, w: 1000 }] },
  ]);
});

describe('yield over time', () => {
  test('by month on the shop’s clock: plan A (23:30 on 29 Nov in Chicago) is November’s, worked by hand', async () => {
    const rows = await yieldOverTime(db, filter());
    // A: 2,000,000 of stock; parts 800,000; spoiled 200,000; kept 450,000; saw waste 2,000,000 − 1,450,000 = 550,000.
    // B: the offcut 500,000 with a 405,000 part (waste 95,000); MDF 1,000,000 with a 300,000 part (waste 700,000).
    expect(rows).toEqual([
      {
        period: '2026-11-01',
        material: 'Birch ply',
        thickness: 18,
        plans: 1,
        stockArea: 2_000_000,
        partArea: 800_000,
        spoiledArea: 200_000,
        keptArea: 450_000,
        sawWasteArea: 550_000,
      },
      {
        period: '2026-12-01',
        material: 'Birch ply',
        thickness: 18,
        plans: 1,
        stockArea: 500_000,
        partArea: 405_000,
        spoiledArea: 0,
        keptArea: 0,
        sawWasteArea: 95_000,
      },
      {
        period: '2026-12-01',
        material: 'MDF',
        thickness: 12,
        plans: 1,
        stockArea: 1_000_000,
        partArea: 300_000,
        spoiledArea: 0,
        keptArea: 0,
        sawWasteArea: 700_000,
      },
    ]);
  });

  test('read in UTC instead, plan A falls on 30 November still, and by week it is the week of Monday 23 November in Chicago but 30 November in UTC', async () => {
    const weekChicago = await yieldOverTime(db, filter({ by: 'week', material: 'Birch ply' }));
    expect(weekChicago.map((r) => [r.period, r.stockArea])).toEqual([
      ['2026-11-23', 2_000_000],
      ['2026-11-30', 500_000],
    ]);
    const weekUtc = await yieldOverTime(db, filter({ by: 'week', material: 'Birch ply', timeZone: 'UTC' }));
    expect(weekUtc.map((r) => [r.period, r.stockArea])).toEqual([['2026-11-30', 2_500_000]]);
  });

  test('the date range is in shop days, both ends included: 30 Nov–1 Dec in Chicago holds plan B only', async () => {
    const rows = await yieldOverTime(db, filter({ from: '2026-11-30', to: '2026-12-01' }));
    expect(rows.map((r) => r.material)).toEqual(['Birch ply', 'MDF']);
    expect(rows.every((r) => r.period === '2026-12-01')).toBe(true);
    expect(await yieldOverTime(db, filter({ from: '2026-11-29', to: '2026-11-29' }))).toHaveLength(1);
  });

  test('narrowed to a job, or to a customer with no jobs, the yield counts only that work', async () => {
    // Both finished plans are fx.myJob's (the pantry has no customer).
    expect((await yieldOverTime(db, filter({ jobId: fx.myJob.id }))).map((r) => r.stockArea)).toEqual([2_000_000, 500_000, 1_000_000]);
    expect(await yieldOverTime(db, filter({ jobId: fx.theirJob.id }))).toEqual([]);
    const [nobody] = await db.insert(customers).values({ shopId: fx.mine.id, name: 'No jobs yet' }).returning();
    expect(await yieldOverTime(db, filter({ customerId: nobody.id }))).toEqual([]);
    // The rack: plan A's offcut and its movements follow its job; the scrap thrown out by hand belongs to no job.
    expect((await offcutUse(db, filter({ jobId: fx.myJob.id }))).map((r) => [r.period, r.racked, r.used, r.scrapped])).toEqual([
      ['2026-11-01', 1, 0, 0],
      ['2026-12-01', 0, 1, 0],
    ]);
  });

  test('another shop’s plans never show, and the materials filter lists only this shop’s', async () => {
    const theirs = await yieldOverTime(db, filter({ shopId: fx.theirs.id }));
    expect(theirs).toEqual([expect.objectContaining({ period: '2026-11-01', stockArea: 2440 * 1220, partArea: 1_000_000 })]);
    expect(await reportMaterials({ db, shopId: fx.mine.id })).toEqual(['Birch ply', 'MDF']);
  });
});

describe('offcut use', () => {
  test('area cut from the rack against new stock, and offcuts racked, used and scrapped, per month in Chicago', async () => {
    const rows = await offcutUse(db, filter());
    expect(rows).toEqual([
      {
        period: '2026-11-01',
        fromRackArea: 0,
        fromNewStockArea: 2_000_000,
        racked: 1,
        rackedArea: 450_000,
        used: 0,
        usedArea: 0,
        scrapped: 0,
        scrappedArea: 0,
      },
      // The scrap went out at 21:00 on 1 December in Chicago, 03:00 on the 2nd in UTC: December either way.
      {
        period: '2026-12-01',
        fromRackArea: 500_000,
        fromNewStockArea: 1_000_000,
        racked: 0,
        rackedArea: 0,
        used: 1,
        usedArea: 500_000,
        scrapped: 1,
        scrappedArea: 60_000,
      },
    ]);
  });

  test('offcuts on the rack longer than six months are listed to use or scrap; used and scrapped ones are not', async () => {
    const old = await oldOffcuts(db, { shopId: fx.mine.id, timeZone: ZONE, months: 6, now: new Date('2026-12-03T12:00:00Z') });
    expect(old).toEqual([
      expect.objectContaining({ material: 'Birch ply', length: 700, width: 300, location: 'Bin 3', rackedOn: '2026-03-15', ageDays: 262 }),
    ]);
    expect(await oldOffcuts(db, { shopId: fx.mine.id, timeZone: ZONE, months: 9, now: new Date('2026-12-03T12:00:00Z') })).toEqual([]);
  });
});

describe('stock value over time, rebuilt from the ledger', () => {
  test('a rack of $68.50 birch sheets and an $11 offcut, month by month in Chicago and in UTC (worked by hand)', async () => {
    // The other shop's rack, so the offcut rows above (which carry no opening count) are not in it.
    const shopId = fx.theirs.id;
    const [sheet] = await db
      .insert(stockItems)
      .values({
        shopId,
        kind: 'sheet',
        material: 'Baltic birch',
        nominalThickness: '1/2"',
        thickness: 12,
        length: 1525,
        width: 1525,
        onHand: 7,
        lowStockAt: 8,
        costCents: 6850,
      })
      .returning();
    const [piece] = await db
      .insert(offcuts)
      .values({
        shopId,
        material: 'Baltic birch',
        thickness: 12,
        length: 600,
        width: 400,
        costCents: 1100,
        createdAt: new Date('2026-11-20T16:00:00Z'),
      })
      .returning();
    await db.insert(stockMovements).values([
      { shopId, kind: 'received', stockItemId: sheet.id, quantity: 10, createdAt: new Date('2026-10-15T15:00:00Z') },
      { shopId, kind: 'reserved', stockItemId: sheet.id, quantity: 0, reservedChange: 3, createdAt: new Date('2026-11-10T15:00:00Z') },
      { shopId, kind: 'offcut-created', offcutId: piece.id, quantity: 1, createdAt: new Date('2026-11-20T16:00:00Z') },
      // Cut at 23:30 on 30 November in Chicago: 05:30 UTC on 1 December.
      { shopId, kind: 'consumed', stockItemId: sheet.id, quantity: -3, reservedChange: -3, createdAt: new Date('2026-12-01T05:30:00Z') },
    ]);
    const chicago = await stockValueReport(db, { shopId, timeZone: ZONE, by: 'month', from: '2026-10-01', to: '2026-12-31' });
    expect(chicago.points.map((p) => [p.period, p.onHandCents, p.reservedCents])).toEqual([
      ['2026-10-01', 10 * 6850, 0],
      ['2026-11-01', 7 * 6850 + 1100, 0],
      ['2026-12-01', 7 * 6850 + 1100, 0],
    ]);
    const utc = await stockValueReport(db, { shopId, timeZone: 'UTC', by: 'month', from: '2026-10-01', to: '2026-12-31' });
    expect(utc.points.map((p) => [p.period, p.onHandCents, p.reservedCents])).toEqual([
      ['2026-10-01', 68_500, 0],
      ['2026-11-01', 68_500 + 1100, 3 * 6850],
      ['2026-12-01', 47_950 + 1100, 0],
    ]);
    // A range that starts after the receipt opens on it.
    const late = await stockValueReport(db, { shopId, timeZone: ZONE, by: 'month', from: '2026-12-01', to: '2026-12-31' });
    expect(late.points).toEqual([{ period: '2026-12-01', onHandCents: 49_050, reservedCents: 0, byMaterial: { 'Baltic birch': 49_050 } }]);
    expect(chicago.unknownPieces).toEqual([]);
    // 7 free against a low mark of 8.
    expect(chicago.low).toEqual([expect.objectContaining({ id: sheet.id, free: 7, lowStockAt: 8 })]);
    // Another material filtered out.
    expect(
      (await stockValueReport(db, { shopId, timeZone: ZONE, by: 'month', from: '2026-10-01', to: '2026-10-31', material: 'MDF' })).points[0]
        .onHandCents,
    ).toBe(0);
  });
});
