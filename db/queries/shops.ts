import type { Scope, ShopScope } from '../scope';
import { eq } from 'drizzle-orm';
import type { DbHandle } from '../open';
import { ReadCache } from '../changes';
import { shops } from '../schema';
import type { ShopSettings } from '@/shared/schemas/shop';
import { recordAudit } from './audit';
import { notFound } from '@/lib/errors';

export async function getShopSettings({ db, shopId }: ShopScope): Promise<ShopSettings> {
  const [row] = await db
    .select({
      name: shops.name,
      units: shops.units,
      currency: shops.currency,
      kerf: shops.kerf,
      edgeTrim: shops.edgeTrim,
      minOffcutLength: shops.minOffcutLength,
      minOffcutWidth: shops.minOffcutWidth,
      minFenceWidth: shops.minFenceWidth,
      wastePercent: shops.wastePercent,
      timeZone: shops.timeZone,
      yieldTargetPercent: shops.yieldTargetPercent,
      offcutAgeMonths: shops.offcutAgeMonths,
    })
    .from(shops)
    .where(eq(shops.id, shopId));
  if (!row) throw notFound('The shop');
  return row as ShopSettings;
}

/** Embedded database only (db/changes.ts): each shop's settings as last read, until a statement on shops commits. */
const keptSettings = new ReadCache<ShopSettings>(['shops']);

/**
 * The shop's settings for a page render: on the embedded database kept until the shops table changes (a saved
 * settings form is seen on the very next request); on PostgreSQL read each time. A copy, so no caller can change
 * the kept one.
 */
export async function readShopSettings(handle: Pick<DbHandle, 'db' | 'changes'>, shopId: string): Promise<ShopSettings> {
  const settings = await keptSettings.get(handle.changes, shopId, () => getShopSettings({ db: handle.db, shopId }));
  return { ...settings };
}

export async function updateShopSettings({ db, shopId, userId }: Scope, patch: Partial<ShopSettings>) {
  // Saving an untouched form sends nothing: nothing to write, nothing to audit.
  if (Object.keys(patch).length === 0) return getShopSettings({ db, shopId });
  await db.transaction(async (tx) => {
    await tx.update(shops).set(patch).where(eq(shops.id, shopId));
    await recordAudit(tx, { shopId, userId, action: 'update', entity: 'shop-settings', entityId: shopId, data: patch });
  });
  return getShopSettings({ db, shopId });
}
