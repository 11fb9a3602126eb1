import { formatLength } from '@/lib/units/format-length';
import type { ShopUnits } from '@/shared/schemas/units';

/** What the stock room offers in one material and thickness (sheets, boards or offcuts). */
export interface StockOffer {
  material: string;
  kind: 'sheet' | 'board' | 'offcut';
  thicknessMm: number;
  /** What the shop calls the thickness ("3/4\"", "4/4"); empty for offcuts. */
  nominal: string;
}

/** Stock within this of a part's thickness is the same stock: sheet thickness varies this much between batches. */
export const THICKNESS_MATCH_TOLERANCE_MM = 0.5;

const same = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/** Offers of one material, any thickness. */
export const offersOf = (offers: readonly StockOffer[], material: string) => offers.filter((o) => same(o.material, material));

/** A warning when nothing in the stock room matches the part's material and thickness; null when something does. */
export function stockMatchWarning(part: { material: string; thicknessMm: number }, offers: readonly StockOffer[], units: ShopUnits): string | null {
  const material = offersOf(offers, part.material);
  if (material.length === 0) return `Nothing in the stock room is “${part.material.trim()}”: it will have to be bought or added to the stock room.`;
  if (material.some((o) => Math.abs(o.thicknessMm - part.thicknessMm) <= THICKNESS_MATCH_TOLERANCE_MM)) return null;
  const have = [...new Set(material.map((o) => formatLength(o.thicknessMm, units)))].join(', ');
  return `The stock room has ${material[0].material} in ${have}, not ${formatLength(part.thicknessMm, units)}.`;
}

/** Solid wood is what the stock room holds as boards (sold by the board foot). */
export const isSolidWood = (material: string, offers: readonly StockOffer[]) => offersOf(offers, material).some((o) => o.kind === 'board');
