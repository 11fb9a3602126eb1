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

/** The stock room's sheets and boards (any count: a size the shop keeps can be bought) and its available offcuts. */
export function toStockOffers(
  items: readonly { material: string; kind: 'sheet' | 'board'; thicknessMm: number; nominalThickness: string }[],
  offcuts: readonly { material: string; thicknessMm: number; status: string }[],
): StockOffer[] {
  const all: StockOffer[] = [
    ...items.map((i) => ({ material: i.material, kind: i.kind, thicknessMm: i.thicknessMm, nominal: i.nominalThickness })),
    ...offcuts.filter((o) => o.status === 'available').map((o) => ({ material: o.material, kind: 'offcut' as const, thicknessMm: o.thicknessMm, nominal: '' })),
  ];
  // One offer per material, kind and thickness: a picker lists each once.
  const seen = new Map<string, StockOffer>();
  for (const o of all) seen.set(`${o.material.toLowerCase()}|${o.kind}|${o.thicknessMm}`, seen.get(`${o.material.toLowerCase()}|${o.kind}|${o.thicknessMm}`) ?? o);
  return [...seen.values()];
}
