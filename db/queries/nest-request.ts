import type { SavedSaw } from '@/shared/wire/settings';
import type { ShopScope } from '../scope';
import { and, eq } from 'drizzle-orm';
import { offcuts, stockItems } from '../schema';
import { costEachCents as priceEach } from '@/lib/stock/pricing';
import { recutNestParts } from '@/lib/recuts/recuts';
import type { NestPart, NestRequestInput, NestSettings, NestStock } from '@/shared/schemas/nesting';
import type { NestFor } from '@/shared/schemas/recut';
import { getShopSettings } from './shops';
import { listParts } from './parts';
import { openRecuts } from './recuts';
import { listSaws } from './saws';
import type { NestSaw } from '@/shared/schemas/saw';
import { invalid } from '@/lib/errors';
import { requestForChoice } from '@/lib/nesting/request-for-choice';
import { stockRef } from '@/lib/stock/stock-ref';

export { stockRef };

/** Sheets cost each; boards by the board foot (lib/stock/pricing). Kept here for the queries that import it. */
export const costEachCents = (item: typeof stockItems.$inferSelect): number => priceEach(item);

/**
 * The job's parts on everything the stock room can offer now (free counts only), with the shop's defaults. With
 * `for: 'recuts'` the parts are only the job's open re-cuts (each with its re-cut's id), nothing of the cut list.
 */
export async function buildNestRequest(
  scope: ShopScope,
  jobId: string,
  choice: Partial<NestSettings> & { sawId?: string; breakdownSawId?: string } = {},
  nestFor: NestFor = 'cut-list',
): Promise<NestRequestInput> {
  const { db, shopId } = scope;
  const { sawId, breakdownSawId, ...settings } = choice;
  const [shop, parts, items, rack, shopSaws] = await Promise.all([
    getShopSettings(scope),
    nestFor === 'recuts' ? openRecuts(scope, jobId).then(recutNestParts) : listParts(scope, jobId).then(cutListParts),
    db.select().from(stockItems).where(eq(stockItems.shopId, shopId)),
    db
      .select()
      .from(offcuts)
      .where(and(eq(offcuts.shopId, shopId), eq(offcuts.status, 'available'))),
    sawId || breakdownSawId ? listSaws(scope) : Promise.resolve([]),
  ]);
  const stock = nestStock(items, rack);
  const offered: NestRequestInput = {
    parts,
    stock,
    settings: {
      kerf: shop.kerf,
      trim: shop.edgeTrim,
      minOffcutLength: shop.minOffcutLength,
      minOffcutWidth: shop.minOffcutWidth,
      minFenceWidth: shop.minFenceWidth,
    },
  };
  return requestForChoice(offered, {
    stockIds: stock.map((s) => s.id),
    settings,
    saw: chosenSaw(shopSaws, sawId, 'sawId'),
    breakdownSaw: chosenSaw(shopSaws, breakdownSawId, 'breakdownSawId'),
  });
}

/**
 * A chosen saw's whole profile goes into the request (a saved plan keeps it), and the plan allows each cut the widest
 * of the chosen saws' kerfs. A saw no longer in the shop's settings is refused on its field.
 */
function chosenSaw(shopSaws: SavedSaw[], id: string | undefined, field: string): NestSaw | undefined {
  if (!id) return undefined;
  const found = shopSaws.find((s) => s.id === id);
  if (!found) throw invalid('That saw is not in Shop settings any more; choose another.', { [field]: ['not a saw of this shop'] });
  const { updatedAt: _u, ...profile } = found;
  return profile;
}

/**
 * What the stock room offers a nest: each size's free count (on hand less reserved), more of it to buy where it can
 * be bought, and every offcut on the rack (already trimmed).
 */
function nestStock(items: (typeof stockItems.$inferSelect)[], rack: (typeof offcuts.$inferSelect)[]): NestStock[] {
  const stock: NestStock[] = [];
  for (const item of items) {
    const base = {
      kind: item.kind,
      length: item.length,
      width: item.width,
      thickness: item.thickness,
      material: item.material,
      grain: item.grain,
      costEach: costEachCents(item),
      source: item.location || undefined,
    };
    const free = item.onHand - item.reserved;
    if (free > 0) stock.push({ ...base, id: stockRef.onHand(item.id), count: free });
    if (item.buyable) stock.push({ ...base, id: stockRef.buy(item.id), count: null, source: item.supplier || undefined });
  }
  for (const o of rack) {
    stock.push({
      id: stockRef.offcut(o.id),
      kind: 'offcut',
      length: o.length,
      width: o.width,
      thickness: o.thickness,
      material: o.material,
      grain: o.grain,
      count: 1,
      costEach: o.costCents,
      trimmed: true,
      source: o.location || undefined,
    });
  }
  return stock;
}

const cutListParts = (parts: Awaited<ReturnType<typeof listParts>>): NestPart[] =>
  parts.map((p) => ({
    id: p.id,
    label: p.label,
    quantity: p.quantity,
    length: p.length,
    width: p.width,
    thickness: p.thickness,
    material: p.material,
    grain: p.grain,
    jointAllowance: p.jointAllowance,
    group: p.drawerScheduleId ?? undefined,
    notes: p.notes || undefined,
  }));
