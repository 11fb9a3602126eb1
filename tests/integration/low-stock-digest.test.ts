import bcrypt from 'bcryptjs';
import { and, eq } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import type { Db } from '@/db/open';
import { lowStockDigests, mailOutbox, purchaseOrders, shops, stockItems, users } from '@/db/schema';
import { runLowStockDigests } from '@/db/queries/low-stock-digest';
import { createFromLowStock, cancelPurchaseOrder } from '@/db/queries/purchase-orders';
import { setUpTwoShopDatabase } from '../support/two-shop-database';
import { nextNumber } from '../support/unique';

let db: Db;
setUpTwoShopDatabase((app) => ({ db } = app));

/** A Chicago shop with a digest at 07:00, two owners (one inactive) and an estimator. */
async function chicagoShop(at = '07:00') {
  const [shop] = await db
    .insert(shops)
    .values({ name: `Prairie Joinery ${nextNumber()}`, timeZone: 'America/Chicago', lowStockDigestTime: at })
    .returning();
  const hash = await bcrypt.hash('x', 4);
  const mk = (role: 'owner' | 'estimator', name: string, active = true) => ({
    shopId: shop.id,
    email: `${name.toLowerCase()}-${nextNumber()}@prairie.example`,
    name,
    role,
    passwordHash: hash,
    active,
  });
  const people = await db
    .insert(users)
    .values([mk('owner', 'Wren'), mk('owner', 'Hale'), mk('owner', 'Gone', false), mk('estimator', 'Esti')])
    .returning();
  return { shop, owners: people.filter((p) => p.role === 'owner' && p.active), people };
}

const sheet = (shopId: string, over: Partial<typeof stockItems.$inferInsert>) =>
  db
    .insert(stockItems)
    .values({
      shopId,
      kind: 'sheet',
      material: `Digest ply ${nextNumber()}`,
      nominalThickness: '3/4"',
      thickness: 18,
      length: 2438.4,
      width: 1219.2,
      costCents: 5000,
      supplier: 'Cedar Run Plywood',
      ...over,
    })
    .returning()
    .then((r) => r[0]);

const mine = (shopId: string, outcomes: Awaited<ReturnType<typeof runLowStockDigests>>) => outcomes.filter((o) => o.shopId === shopId);
const mails = (shopId: string) =>
  db
    .select()
    .from(mailOutbox)
    .where(and(eq(mailOutbox.shopId, shopId), eq(mailOutbox.kind, 'low-stock-digest')));

// America/Chicago is CST (UTC−6) on 2026-12-03: 07:00 local is 13:00Z (IANA tz database; worked by hand).
describe('the low-stock digest', () => {
  test('not at 06:59 local, sent at 07:00 to each active owner, then not again that day', async () => {
    const { shop, owners } = await chicagoShop();
    const low = await sheet(shop.id, { onHand: 2, lowStockAt: 3 });
    await sheet(shop.id, { onHand: 9, lowStockAt: 3 });
    expect(mine(shop.id, await runLowStockDigests(db, new Date('2026-12-03T12:59:00Z')))).toEqual([]);
    expect(await mails(shop.id)).toEqual([]);
    expect(mine(shop.id, await runLowStockDigests(db, new Date('2026-12-03T13:00:00Z')))).toEqual([
      { shopId: shop.id, day: '2026-12-03', sizes: 1, mails: 2 },
    ]);
    const sent = await mails(shop.id);
    expect(sent.map((m) => m.toAddress).sort()).toEqual(owners.map((o) => o.email).sort());
    expect(sent[0].subject).toBe(`1 stock size running low at ${shop.name}`);
    expect(sent[0].textBody).toContain(`${low.material} ¾″, 96″ × 48″: 2 free, mark 3 (Cedar Run Plywood)`);
    // Later that day, and at 23:30 local (05:30Z on the 4th), it is still the 3rd: nothing more.
    expect(mine(shop.id, await runLowStockDigests(db, new Date('2026-12-03T20:00:00Z')))).toEqual([]);
    expect(mine(shop.id, await runLowStockDigests(db, new Date('2026-12-04T05:30:00Z')))).toEqual([]);
    expect(await mails(shop.id)).toHaveLength(2);
    // The next local day at 07:00 it goes again.
    expect(mine(shop.id, await runLowStockDigests(db, new Date('2026-12-04T13:00:00Z')))).toEqual([
      { shopId: shop.id, day: '2026-12-04', sizes: 1, mails: 2 },
    ]);
  });

  test('two app servers at the same minute: one digest (one row per shop-day, claimed in the mail’s transaction)', async () => {
    const { shop } = await chicagoShop();
    await sheet(shop.id, { onHand: 0, lowStockAt: 2 });
    const at = new Date('2026-12-05T13:01:00Z');
    const [a, b] = await Promise.all([runLowStockDigests(db, at), runLowStockDigests(db, at)]);
    expect([...mine(shop.id, a), ...mine(shop.id, b)]).toEqual([{ shopId: shop.id, day: '2026-12-05', sizes: 1, mails: 2 }]);
    expect(await mails(shop.id)).toHaveLength(2);
    expect(await db.select().from(lowStockDigests).where(eq(lowStockDigests.shopId, shop.id))).toHaveLength(1);
  });

  test('sizes on an open order are left out; nothing low sends nothing (and the day is still done)', async () => {
    const { shop, owners } = await chicagoShop();
    const s = await sheet(shop.id, { onHand: 1, lowStockAt: 3 });
    const [poId] = await createFromLowStock({ db, shopId: shop.id, userId: owners[0].id });
    expect(mine(shop.id, await runLowStockDigests(db, new Date('2026-12-06T13:00:00Z')))).toEqual([
      { shopId: shop.id, day: '2026-12-06', sizes: 0, mails: 0 },
    ]);
    expect(await mails(shop.id)).toEqual([]);
    // Cancel the order: the size is listed again, the next day.
    await cancelPurchaseOrder({ db, shopId: shop.id, userId: owners[0].id }, poId);
    expect((await db.select().from(purchaseOrders).where(eq(purchaseOrders.id, poId)))[0].status).toBe('cancelled');
    expect(mine(shop.id, await runLowStockDigests(db, new Date('2026-12-07T13:00:00Z')))).toEqual([
      { shopId: shop.id, day: '2026-12-07', sizes: 1, mails: 2 },
    ]);
    expect((await mails(shop.id))[0].textBody).toContain(s.material);
  });

  test('on the day the clocks go forward (2026-03-08, CDT from 02:00) 07:00 local is 12:00Z', async () => {
    const { shop } = await chicagoShop();
    await sheet(shop.id, { onHand: 0, lowStockAt: 1 });
    expect(mine(shop.id, await runLowStockDigests(db, new Date('2026-03-08T11:59:00Z')))).toEqual([]);
    expect(mine(shop.id, await runLowStockDigests(db, new Date('2026-03-08T12:00:00Z')))).toEqual([
      { shopId: shop.id, day: '2026-03-08', sizes: 1, mails: 2 },
    ]);
  });

  test("a shop with the digest off (time '') gets none", async () => {
    const { shop } = await chicagoShop('');
    await sheet(shop.id, { onHand: 0, lowStockAt: 1 });
    expect(mine(shop.id, await runLowStockDigests(db, new Date('2026-12-03T18:00:00Z')))).toEqual([]);
  });
});
