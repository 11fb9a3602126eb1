import { formatLength } from '@/lib/units/format-length';
import { parseLength } from '@/lib/units/parse-length';
import type { UploadReport } from './validate-rows';
import type { ShopUnits } from '@/shared/schemas/units';

/** What the stock room offers in one material and thickness (sheets, boards or offcuts). */
export interface StockOffer {
  material: string;
  kind: 'sheet' | 'board' | 'offcut';
  thicknessMm: number;
  /** What the shop calls the thickness ("3/4\"", "4/4"); empty for offcuts. */
  nominal: string;
}

/** Thicknesses this close are the same stock, as the nesting engine matches them (lib/nesting/stock-rules.ts). */
export const THICKNESS_MATCH_TOLERANCE_MM = 0.01;

/**
 * A typed thickness this close to a stock's actual or nominal thickness means that stock: "3/4" for a 23/32″ sheet
 * sold as 3/4″, "18" for 18.3 mm (common practice, no source: nominal and actual sheet thickness differ by up to ~1 mm).
 */
export const THICKNESS_SNAP_MM = 1.1;

const same = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/** Offers of one material, any thickness. */
export const offersOf = (offers: readonly StockOffer[], material: string) => offers.filter((o) => same(o.material, material));

const nominalMm = (nominal: string): number | null => {
  if (!nominal.trim()) return null;
  const parsed = parseLength(nominal, { unit: 'in' });
  return parsed.ok ? parsed.mm : null;
};

/**
 * The stock room's actual thickness for a part typed with the nominal or a near value, so the part nests on that
 * stock; the typed thickness when no stock of the material is near it.
 */
export function snapThickness(material: string, thicknessMm: number, offers: readonly StockOffer[]): number {
  let best: { mm: number; off: number } | null = null;
  for (const o of offersOf(offers, material)) {
    const nominal = nominalMm(o.nominal);
    const off = Math.min(Math.abs(o.thicknessMm - thicknessMm), nominal === null ? Infinity : Math.abs(nominal - thicknessMm));
    if (off <= THICKNESS_SNAP_MM && (!best || off < best.off)) best = { mm: o.thicknessMm, off };
  }
  return best ? best.mm : thicknessMm;
}

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

/** Uploaded thicknesses written as the nominal ("3/4") become the stock's actual thickness, as in the editor. */
export function snapReport(report: UploadReport, offers: readonly StockOffer[]): UploadReport {
  const snap = <T extends { part: { material: string; thicknessMm: number } }>(r: T): T => ({ ...r, part: { ...r.part, thicknessMm: snapThickness(r.part.material, r.part.thicknessMm, offers) } });
  return { ...report, valid: report.valid.map(snap), rows: report.rows.map((r) => (r.ok ? snap(r) : r)) };
}
