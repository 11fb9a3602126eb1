/**
 * What to order, before it is a purchase order: lines from a plan's stock to buy or from the sizes running low,
 * grouped into one order per supplier. Pure: the queries (db/queries/purchase-orders.ts) feed it rows.
 */
import { isLowStock } from '@/lib/stock/low-stock';

/** A stock size as the buying side reads it. */
export interface BuyableSize {
  id: string;
  supplier: string;
  onHand: number;
  reserved: number;
  lowStockAt: number;
  /** The stock room's cost: each sheet, or per board foot for boards (minor units). */
  costCents: number;
}

export interface OrderLine {
  stockItemId: string;
  quantity: number;
  unitCostCents: number;
}

export interface SupplierOrder {
  /** The supplier as the stock room names it ('' when the size names none). */
  supplier: string;
  lines: OrderLine[];
}

/** A takeoff line as the plan reads it: `buy` pieces are all bought; `stock` pieces only beyond what is free. */
export interface StockToBuyLine {
  /** `buy:<id>` or `stock:<id>` (offcuts are never bought). */
  source: 'stock' | 'offcut' | 'buy';
  stockItemId: string;
  count: number;
  free: number;
  heldByPlan: number;
}

/**
 * The pieces a plan still needs bought, per stock size: every piece of a size it buys, and for a size it pulls from
 * the rack, the pieces the rack is short of (count − free − already held by the plan). A size named twice (pulled and
 * bought) is one line. Offcuts are never bought.
 */
export function piecesToBuy(lines: readonly StockToBuyLine[]): Map<string, number> {
  const out = new Map<string, number>();
  for (const l of lines) {
    if (l.source === 'offcut') continue;
    const n = l.source === 'buy' ? l.count : Math.max(0, l.count - Math.max(0, l.free) - l.heldByPlan);
    if (n > 0) out.set(l.stockItemId, (out.get(l.stockItemId) ?? 0) + n);
  }
  return out;
}

/**
 * How many to reorder of a size running low: enough to bring what is free (and already on open orders) up to twice
 * its low mark — the mark is the reorder point, twice it the level to order up to (a min/max rule: common practice,
 * no source). Nothing for a size not low, or not watched (mark 0), or already covered by open orders.
 */
export function reorderQuantity(size: Pick<BuyableSize, 'onHand' | 'reserved' | 'lowStockAt'>, onOrder = 0): number {
  if (!isLowStock(size)) return 0;
  const free = size.onHand - size.reserved;
  return Math.max(0, 2 * size.lowStockAt - free - onOrder);
}

/** Groups wanted pieces per size into one order per supplier, suppliers and lines in a stable order. */
export function groupBySupplier(wanted: ReadonlyMap<string, number>, sizes: readonly BuyableSize[]): SupplierOrder[] {
  const bySupplier = new Map<string, { supplier: string; lines: OrderLine[] }>();
  for (const size of sizes) {
    const quantity = wanted.get(size.id) ?? 0;
    if (quantity <= 0) continue;
    const supplier = size.supplier.trim();
    const key = supplier.toLowerCase();
    const group = bySupplier.get(key) ?? { supplier, lines: [] };
    group.lines.push({ stockItemId: size.id, quantity, unitCostCents: size.costCents });
    bySupplier.set(key, group);
  }
  return [...bySupplier.values()].sort((a, b) => a.supplier.localeCompare(b.supplier));
}

/** Orders for the sizes running low, each size less what open orders already bring. */
export function lowStockOrders(sizes: readonly BuyableSize[], onOrder: ReadonlyMap<string, number>): SupplierOrder[] {
  const wanted = new Map(sizes.map((s) => [s.id, reorderQuantity(s, onOrder.get(s.id) ?? 0)]));
  return groupBySupplier(wanted, sizes);
}
