import type { ShopScope } from '../scope';
import { and, desc, eq, inArray, ne, sql } from 'drizzle-orm';
import { offcuts, plans, stockItems, stockMovements } from '../schema';
import { readPlan } from '@/lib/nesting';
import { takeoff, type TakeoffSize } from '@/lib/stock/takeoff';
import { costEachCents, stockRef } from './nest-request';
import type { StockRef } from '@/lib/stock/stock-ref';
import type { PlanPiece } from '@/shared/schemas/nesting';
import { getShopSettings } from './shops';

/** The job's plans a takeoff can be read from (cancelled ones aside), newest first. */
export async function takeoffPlans({ db, shopId }: ShopScope, jobId: string) {
  return db
    .select({ id: plans.id, name: plans.name, status: plans.status })
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.jobId, jobId), ne(plans.status, 'cancelled')))
    .orderBy(desc(plans.createdAt));
}

/**
 * The material check before a quote, for one of a job's plans (the latest unless one is named; cancelled ones
 * aside): what to pull, what to buy, board feet or area, cost, the spoilage allowance once per material, whether
 * the stock room covers it now, and any part not placed. Null while the job has no plan: the page says so, as a
 * state of the job rather than a refusal.
 */
export async function getTakeoff(scope: ShopScope, jobId: string, planId?: string) {
  const row = await takeoffPlan(scope, jobId, planId);
  if (!row) return null;
  const plan = readPlan(row.document);
  const counts = new Map<string, number>();
  for (const p of plan.pieces) counts.set(p.stockId, (counts.get(p.stockId) ?? 0) + 1);
  const [settings, stock] = await Promise.all([getShopSettings(scope), stockOfPlan(scope, row.id, [...counts.keys()])]);
  const { sizes, missing } = takeoffSizes(plan.pieces, counts, stock);
  const { lines, allowances, totals } = takeoff(sizes, settings.wastePercent);
  return {
    plan: { id: row.id, name: row.name, status: row.status, createdAt: row.createdAt },
    allowancePercent: settings.wastePercent,
    allowances,
    pull: lines.filter((l) => l.source !== 'buy'),
    buy: lines.filter((l) => l.source === 'buy'),
    totals: { ...totals, covered: totals.covered && missing.length === 0, coveredReady: totals.coveredReady && missing.length === 0 },
    unplaced: plan.unplaced,
    /** Sizes the plan names that are no longer in the stock room: re-nest. */
    gone: missing,
  };
}

/** The named plan of the job, or its latest; cancelled plans aside. */
async function takeoffPlan({ db, shopId }: ShopScope, jobId: string, planId?: string) {
  const [row] = await db
    .select()
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.jobId, jobId), ne(plans.status, 'cancelled'), planId ? eq(plans.id, planId) : undefined))
    .orderBy(desc(plans.createdAt))
    .limit(1);
  return row;
}

interface PlanStock {
  refs: { key: string; ref: StockRef | null }[];
  items: (typeof stockItems.$inferSelect)[];
  rack: (typeof offcuts.$inferSelect)[];
  /** What the plan already holds of each stock size or offcut (it counts as available to the plan). */
  heldFor: (id: string) => number;
}

/** The stock rows a plan's pieces name, and what the plan already holds of them. */
async function stockOfPlan({ db, shopId }: ShopScope, planId: string, stockIds: string[]): Promise<PlanStock> {
  const refs = stockIds.map((key) => ({ key, ref: stockRef.parse(key) }));
  const itemIds = refs.flatMap((r) => (r.ref && r.ref.source !== 'offcut' ? [r.ref.id] : []));
  const offcutIds = refs.flatMap((r) => (r.ref?.source === 'offcut' ? [r.ref.id] : []));
  const [items, rack, held] = await Promise.all([
    itemIds.length
      ? db
          .select()
          .from(stockItems)
          .where(and(eq(stockItems.shopId, shopId), inArray(stockItems.id, itemIds)))
      : [],
    offcutIds.length
      ? db
          .select()
          .from(offcuts)
          .where(and(eq(offcuts.shopId, shopId), inArray(offcuts.id, offcutIds)))
      : [],
    db
      .select({
        stockItemId: stockMovements.stockItemId,
        offcutId: stockMovements.offcutId,
        n: sql<number>`sum(${stockMovements.reservedChange})`.mapWith(Number),
      })
      .from(stockMovements)
      .where(and(eq(stockMovements.shopId, shopId), eq(stockMovements.planId, planId)))
      .groupBy(stockMovements.stockItemId, stockMovements.offcutId),
  ]);
  const heldFor = (id: string) => held.find((h) => h.stockItemId === id || h.offcutId === id)?.n ?? 0;
  return { refs, items, rack, heldFor };
}

/** One takeoff size per stock reference of the plan; a size the stock room no longer has is named as missing. */
function takeoffSizes(pieces: PlanPiece[], counts: Map<string, number>, { refs, items, rack, heldFor }: PlanStock) {
  const sizes: TakeoffSize[] = [];
  const missing: string[] = [];
  for (const { key, ref } of refs) {
    const count = counts.get(key)!;
    const piece = pieces.find((p) => p.stockId === key)!;
    if (ref?.source === 'offcut') {
      const o = rack.find((r) => r.id === ref.id);
      sizes.push({
        stockId: key,
        source: 'offcut',
        kind: 'offcut',
        material: piece.material,
        nominalThickness: '',
        thickness: piece.thickness,
        length: piece.length,
        width: piece.width,
        count,
        costEachCents: o?.costCents ?? 0,
        free: o?.status === 'available' ? 1 : 0,
        heldByPlan: o ? heldFor(o.id) : 0,
      });
      continue;
    }
    const item = ref && items.find((i) => i.id === ref.id);
    if (!item || !ref) {
      missing.push(piece.material);
      continue;
    }
    sizes.push({
      stockId: key,
      source: ref.source,
      kind: item.kind,
      material: item.material,
      nominalThickness: item.nominalThickness,
      thickness: item.thickness,
      length: item.length,
      width: item.width,
      count,
      costEachCents: costEachCents(item),
      free: item.onHand - item.reserved,
      heldByPlan: heldFor(item.id),
    });
  }
  return { sizes, missing };
}
