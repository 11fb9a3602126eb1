import type { PricingView } from '@/shared/wire/settings';
import type { Scope, ShopScope } from '../scope';
import { and, asc, eq } from 'drizzle-orm';
import { hardwareItems, shops } from '../schema';
import { DEFAULT_PRICING, pricingSettingsSchema, type HardwareItem, type HardwareItemInput, type PricingSettings } from '@/shared/schemas/pricing';
import { recordAudit } from './audit';
import { conflict, notFound } from '@/lib/errors';

export type { PricingView } from '@/shared/wire/settings';

/** The shop's pricing settings; a stored value missing a field (written before it existed) takes the default. */
export async function getPricing({ db, shopId }: ShopScope): Promise<PricingView> {
  const [row] = await db.select({ currency: shops.currency, pricing: shops.pricing }).from(shops).where(eq(shops.id, shopId));
  if (!row) throw notFound('The shop');
  const merged = pricingSettingsSchema.safeParse({ ...DEFAULT_PRICING, ...row.pricing });
  return { currency: row.currency, pricing: merged.success ? merged.data : DEFAULT_PRICING };
}

export async function setPricing({ db, shopId, userId }: Scope, pricing: PricingSettings): Promise<PricingView> {
  await db.transaction(async (tx) => {
    await tx.update(shops).set({ pricing }).where(eq(shops.id, shopId));
    await recordAudit(tx, { shopId, userId, action: 'update', entity: 'pricing-settings', entityId: shopId, data: pricing });
  });
  return getPricing({ db, shopId });
}

const toItem = (row: typeof hardwareItems.$inferSelect): HardwareItem => ({ id: row.id, name: row.name, unit: row.unit, priceMinor: row.priceMinor });

export async function listHardware({ db, shopId }: ShopScope): Promise<HardwareItem[]> {
  return (await db.select().from(hardwareItems).where(eq(hardwareItems.shopId, shopId)).orderBy(asc(hardwareItems.name))).map(toItem);
}

const sameName = (name: string) => conflict(`The price list already has “${name}”: change that one, or give this another name.`);
const isUniqueViolation = (e: unknown) =>
  (e as { code?: string; cause?: { code?: string } })?.code === '23505' || (e as { cause?: { code?: string } })?.cause?.code === '23505';

export async function createHardware({ db, shopId, userId }: Scope, input: HardwareItemInput): Promise<HardwareItem> {
  try {
    return await db.transaction(async (tx) => {
      const [row] = await tx
        .insert(hardwareItems)
        .values({ ...input, shopId })
        .returning();
      await recordAudit(tx, { shopId, userId, action: 'create', entity: 'hardware-item', entityId: row.id, data: input });
      return toItem(row);
    });
  } catch (e) {
    if (isUniqueViolation(e)) throw sameName(input.name);
    throw e;
  }
}

export async function updateHardware({ db, shopId, userId }: Scope, id: string, input: HardwareItemInput): Promise<HardwareItem> {
  try {
    return await db.transaction(async (tx) => {
      const [row] = await tx
        .update(hardwareItems)
        .set(input)
        .where(and(eq(hardwareItems.shopId, shopId), eq(hardwareItems.id, id)))
        .returning();
      if (!row) throw notFound('That item');
      await recordAudit(tx, { shopId, userId, action: 'update', entity: 'hardware-item', entityId: id, data: input });
      return toItem(row);
    });
  } catch (e) {
    if (isUniqueViolation(e)) throw sameName(input.name);
    throw e;
  }
}

export async function deleteHardware({ db, shopId, userId }: Scope, id: string): Promise<void> {
  await db.transaction(async (tx) => {
    const rows = await tx
      .delete(hardwareItems)
      .where(and(eq(hardwareItems.shopId, shopId), eq(hardwareItems.id, id)))
      .returning({ name: hardwareItems.name });
    if (!rows.length) throw notFound('That item');
    await recordAudit(tx, { shopId, userId, action: 'delete', entity: 'hardware-item', entityId: id, data: rows[0] });
  });
}
