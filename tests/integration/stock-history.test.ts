import { eq } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import type { Db } from '@/db/open';
import { offcuts, stockMovements } from '@/db/schema';
import { ledgerMismatches, listMovements } from '@/db/queries/stock';
import { describeMovement } from '@/lib/stock/describe-movement';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { cancel, counts, finish, jobWithSheet, nestAndSave, release } from '../support/shop-day';

let db: Db;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ db, fx } = app));

/** A part as large as one 2440 × 1220 sheet allows after trim: one part takes one sheet. */
const oneSheetEach = (quantity: number) => [{ label: 'Panel', quantity, length: 2000, width: 1000 }];

/** The plan's ledger rows in words, oldest first, as the Stock room's history reads them. */
async function historyOf(planId: string) {
  const rows = (await listMovements({ db, shopId: fx.mine.id })).filter((m) => m.planId === planId).reverse();
  return rows.map((m) => ({ ...describeMovement(m), item: m.stockItemId ? 'sheet' : 'offcut' }));
}

describe('the stock history of a plan: one row per physical change, saying reserved or cut', () => {
  test('one sheet released then finished reads "Reserved +1", then one "Cut (was reserved)" row, never a release and a cut', async () => {
    const { job, sheet } = await jobWithSheet(db, fx.mine.id, { parts: oneSheetEach(1), onHand: 5 });
    const { id } = await nestAndSave(fx.estimator, job.id);
    expect(await counts(db, sheet.id)).toEqual({ onHand: 5, reserved: 0, free: 5 });

    await release(fx.estimator, id);
    expect(await counts(db, sheet.id)).toEqual({ onHand: 5, reserved: 1, free: 4 });
    expect(await historyOf(id)).toEqual([expect.objectContaining({ what: 'Reserved', onHand: '—', reserved: '+1' })]);

    await finish(fx.cutter, id);
    // The sheet leaves the rack; its reservation ends with it; the free count does not move.
    expect(await counts(db, sheet.id)).toEqual({ onHand: 4, reserved: 0, free: 4 });
    const history = await historyOf(id);
    expect(history.filter((h) => h.item === 'sheet')).toEqual([
      expect.objectContaining({ what: 'Reserved', onHand: '—', reserved: '+1' }),
      expect.objectContaining({ what: 'Cut (was reserved)', onHand: '−1', reserved: '−1' }),
    ]);
    expect(history.some((h) => h.what === 'Reservation given back')).toBe(false);
    expect(await ledgerMismatches({ db, shopId: fx.mine.id })).toEqual([]);
  });

  test('a cancel gives the reservation back in one row: on hand as it was, free again', async () => {
    const { job, sheet } = await jobWithSheet(db, fx.mine.id, { parts: oneSheetEach(2), onHand: 3 });
    const { id } = await nestAndSave(fx.estimator, job.id);
    await release(fx.estimator, id);
    expect(await counts(db, sheet.id)).toEqual({ onHand: 3, reserved: 2, free: 1 });
    await cancel(fx.estimator, id);
    expect(await counts(db, sheet.id)).toEqual({ onHand: 3, reserved: 0, free: 3 });
    expect(await historyOf(id)).toEqual([
      expect.objectContaining({ what: 'Reserved', onHand: '—', reserved: '+2' }),
      expect.objectContaining({ what: 'Reservation given back', onHand: '—', reserved: '−2' }),
    ]);
    expect(await ledgerMismatches({ db, shopId: fx.mine.id })).toEqual([]);
  });

  test('release, finish and the offcuts it racks keep on hand, reserved and free right, and the ledger sums to them', async () => {
    const { job, sheet } = await jobWithSheet(db, fx.mine.id, { parts: [{ label: 'Side', quantity: 3, length: 1800, width: 600 }], onHand: 6 });
    const { id, plan } = await nestAndSave(fx.estimator, job.id);
    const used = plan.pieces.length;
    await release(fx.estimator, id);
    expect(await counts(db, sheet.id)).toEqual({ onHand: 6, reserved: used, free: 6 - used });
    const done = await finish(fx.cutter, id);
    expect(await counts(db, sheet.id)).toEqual({ onHand: 6 - used, reserved: 0, free: 6 - used });
    const racked = await db.select().from(offcuts).where(eq(offcuts.sourcePlanId, id));
    expect(racked).toHaveLength(done.body.offcuts.length);
    const rows = await db.select().from(stockMovements).where(eq(stockMovements.planId, id));
    // One reservation and one cut for the sheets; one row per offcut racked.
    expect(rows.filter((r) => r.stockItemId === sheet.id).map((r) => [r.kind, r.quantity, r.reservedChange])).toEqual(
      expect.arrayContaining([
        ['reserved', 0, used],
        ['consumed', -used, -used],
      ]),
    );
    expect(rows.filter((r) => r.stockItemId === sheet.id)).toHaveLength(2);
    expect(rows.filter((r) => r.kind === 'offcut-created')).toHaveLength(racked.length);
    expect(await ledgerMismatches({ db, shopId: fx.mine.id })).toEqual([]);
  });
});
