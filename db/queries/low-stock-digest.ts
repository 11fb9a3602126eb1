import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import type { Db } from '../open';
import { lowStockDigests, purchaseOrderLines, purchaseOrders, shops, stockItems, users } from '../schema';
import { digestDue, digestSizes } from '@/lib/buying/digest';
import { describeSize } from '@/lib/buying/describe';
import { lowStockDigestMail } from '@/lib/buying/mail';
import { appBaseUrl } from '@/lib/mail/config';
import { enqueueMail } from '@/server/mail/outbox';
import { OPEN_STATUSES } from './purchase-orders';

export interface DigestOutcome {
  shopId: string;
  day: string;
  /** Sizes listed (0: nothing low, no mail). */
  sizes: number;
  mails: number;
}

/**
 * One round of the low-stock digest: for every shop whose local clock has reached its digest time and that has no
 * digest row for its local day yet, one transaction claims the day (insert … on conflict do nothing: a second app
 * server doing the same finds the row taken and does nothing), lists the sizes at or below their mark and on no open
 * order, and queues one mail per active owner, or none when nothing is low. Returns what it did.
 */
export async function runLowStockDigests(db: Db, now: Date = new Date()): Promise<DigestOutcome[]> {
  const done: DigestOutcome[] = [];
  for (const shop of await digestShops(db)) {
    const { due, day } = digestDue({ now, zone: shop.zone, at: shop.at, lastDay: shop.lastDay });
    if (!due) continue;
    const outcome = await db.transaction(async (tx) => {
      const claimed = await tx
        .insert(lowStockDigests)
        .values({ shopId: shop.id, day, sizes: 0 })
        .onConflictDoNothing()
        .returning({ day: lowStockDigests.day });
      if (!claimed.length) return null;
      const { low, owners } = await lowSizesAndOwners(tx, shop.id);
      const mailId = low.length ? await queueDigestMails(tx, shop, day, low, owners) : null;
      await tx
        .update(lowStockDigests)
        .set({ sizes: low.length, mailId })
        .where(and(eq(lowStockDigests.shopId, shop.id), eq(lowStockDigests.day, day)));
      return { shopId: shop.id, day, sizes: low.length, mails: low.length ? owners.length : 0 };
    });
    if (outcome) done.push(outcome);
  }
  return done;
}

type DigestShop = Awaited<ReturnType<typeof digestShops>>[number];

/** The shops that send a digest, with their clock, digest time and the last day one was claimed for. */
function digestShops(db: Db) {
  return db
    .select({
      id: shops.id,
      name: shops.name,
      zone: shops.timeZone,
      at: shops.lowStockDigestTime,
      units: shops.units,
      lastDay: sql<string | null>`(select max(${lowStockDigests.day}) from ${lowStockDigests} where ${lowStockDigests.shopId} = ${shops.id})`,
    })
    .from(shops)
    .where(sql`${shops.lowStockDigestTime} <> ''`);
}

/** The shop's sizes at or below their mark and on no open order, and its active owners (newest first). */
async function lowSizesAndOwners(tx: Db, shopId: string) {
  const [items, ordered, owners] = await Promise.all([
    tx
      .select()
      .from(stockItems)
      .where(eq(stockItems.shopId, shopId))
      .orderBy(asc(stockItems.kind), asc(stockItems.material), asc(stockItems.thickness)),
    tx
      .selectDistinct({ stockItemId: purchaseOrderLines.stockItemId })
      .from(purchaseOrderLines)
      .innerJoin(purchaseOrders, eq(purchaseOrders.id, purchaseOrderLines.purchaseOrderId))
      .where(
        and(
          eq(purchaseOrderLines.shopId, shopId),
          inArray(purchaseOrders.status, [...OPEN_STATUSES]),
          sql`${purchaseOrderLines.received} < ${purchaseOrderLines.quantity}`,
        ),
      ),
    tx
      .select({ name: users.name, email: users.email })
      .from(users)
      .where(and(eq(users.shopId, shopId), eq(users.role, 'owner'), eq(users.active, true)))
      .orderBy(desc(users.createdAt)),
  ]);
  return { low: digestSizes(items, new Set(ordered.map((o) => o.stockItemId))), owners };
}

/** One digest mail per owner, in the same transaction; answers the first mail's id for the digest row. */
async function queueDigestMails(
  tx: Db,
  shop: DigestShop,
  day: string,
  low: (typeof stockItems.$inferSelect)[],
  owners: { name: string; email: string }[],
): Promise<string | null> {
  const lines = low.map((i) => ({ description: describeSize(i, shop.units), free: i.onHand - i.reserved, mark: i.lowStockAt, supplier: i.supplier }));
  let mailId: string | null = null;
  for (const owner of owners) {
    const mail = lowStockDigestMail({ shopName: shop.name, personName: owner.name, day, lines, link: `${appBaseUrl()}/purchase-orders` });
    const queued = await enqueueMail(tx, {
      shopId: shop.id,
      kind: 'low-stock-digest',
      to: owner.email,
      subject: mail.subject,
      text: mail.text,
      html: mail.html,
    });
    mailId ??= queued.id;
  }
  return mailId;
}
