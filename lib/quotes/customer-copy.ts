import type { QuoteTotals } from '@/lib/costing/quote-totals';
import type { QuoteLine } from '@/shared/schemas/quote';

/**
 * A quote as its customer may see it: each line's price, and the totals they pay. Never the cost, markup, margin or
 * hours: labour is one sum (its hours and rates are the shop's own), and no field of the estimator's is copied.
 */
export interface CustomerLine {
  id: string;
  description: string;
  /** Null for labour (shown as a sum). */
  quantity: number | null;
  unit: string;
  unitPriceMinor: number | null;
  priceMinor: number;
}

export interface CustomerTotals {
  subtotalMinor: number;
  discountMinor: number;
  taxMinor: number;
  totalMinor: number;
  depositMinor: number;
  balanceMinor: number;
}

export function customerCopy(lines: QuoteLine[], totals: QuoteTotals): { lines: CustomerLine[]; totals: CustomerTotals } {
  return {
    lines: lines.map((l, i) => {
      const labour = l.kind === 'labour';
      return {
        id: l.id,
        description: l.description,
        quantity: labour ? null : l.quantity,
        unit: labour ? '' : l.unit,
        unitPriceMinor: labour ? null : totals.lines[i].unitPriceMinor,
        priceMinor: totals.lines[i].priceMinor,
      };
    }),
    totals: {
      subtotalMinor: totals.subtotalMinor,
      discountMinor: totals.discountMinor,
      taxMinor: totals.taxMinor,
      totalMinor: totals.totalMinor,
      depositMinor: totals.depositMinor,
      balanceMinor: totals.balanceMinor,
    },
  };
}
