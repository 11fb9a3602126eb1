import { exactLengthText } from './exact-length';
import { parseLength } from '@/lib/units/parse-length';
import type { UploadReport } from './validate-rows';
import type { ShopUnits } from '@/shared/schemas/units';
import type { StockOffer } from '@/shared/wire/stock';

/** What the stock room offers in one material and thickness (sheets, boards or offcuts). */
export type { StockOffer };

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
export function snapThickness(material: string, thickness: number, offers: readonly StockOffer[]): number {
  let best: { mm: number; off: number } | null = null;
  for (const o of offersOf(offers, material)) {
    const nominal = nominalMm(o.nominal);
    const off = Math.min(Math.abs(o.thickness - thickness), nominal === null ? Infinity : Math.abs(nominal - thickness));
    if (off <= THICKNESS_SNAP_MM && (!best || off < best.off)) best = { mm: o.thickness, off };
  }
  return best ? best.mm : thickness;
}

/** One thickness the stock room has in a material, as a picker offers it. */
export interface ThicknessChoice {
  thickness: number;
  /** Text that reads back to exactly this thickness (for a length field). */
  text: string;
  /** "3/4″ sheet · 18 mm actual", "4/4 board · 13/16″ actual", "offcuts · 6 mm". */
  label: string;
}

const KIND_NAMES = { sheet: 'sheet', board: 'board', offcut: 'offcuts' } as const;

/** A nominal thickness as the stock room wrote it ("3/4\"", "4/4"), with typeset inch and foot marks. */
export const typesetNominal = (nominal: string) => nominal.trim().replace(/"/g, '″').replace(/'/g, '′');

/**
 * Every thickness the stock room has in a material, thinnest first, each named as the shop buys it (its nominal
 * thickness and kind) with the actual size it is sized and nested on. Offcuts name a thickness only when no sheet or
 * board of it is kept.
 */
export function thicknessChoices(material: string, offers: readonly StockOffer[], units: ShopUnits): ThicknessChoice[] {
  const byThickness = new Map<number, StockOffer[]>();
  for (const o of offersOf(offers, material)) {
    const key = [...byThickness.keys()].find((t) => Math.abs(t - o.thickness) <= THICKNESS_MATCH_TOLERANCE_MM) ?? o.thickness;
    byThickness.set(key, [...(byThickness.get(key) ?? []), o]);
  }
  return [...byThickness.entries()]
    .sort(([a], [b]) => a - b)
    .map(([thickness, group]) => {
      const text = exactLengthText(thickness, units);
      const bought = group.filter((o) => o.kind !== 'offcut');
      const names = [...new Set(bought.map((o) => (o.nominal.trim() ? `${typesetNominal(o.nominal)} ${KIND_NAMES[o.kind]}` : KIND_NAMES[o.kind])))];
      const label = names.length ? `${names.join(', ')} · ${text} actual` : `offcuts · ${text}`;
      return { thickness, text, label };
    });
}

/**
 * A warning when nothing in the stock room matches the part's material and thickness, naming what it does have;
 * null when something matches (the nesting engine's 0.01 mm).
 */
export function stockMatchWarning(part: { material: string; thickness: number }, offers: readonly StockOffer[], units: ShopUnits): string | null {
  const name = part.material.trim();
  const choices = thicknessChoices(name, offers, units);
  if (choices.length === 0) return `The stock room has no ${name} at all: add it there before nesting, or pick a material it has.`;
  if (choices.some((c) => Math.abs(c.thickness - part.thickness) <= THICKNESS_MATCH_TOLERANCE_MM)) return null;
  const have = choices.map((c) => c.label).join('; ');
  return `The stock room has no ${name} ${exactLengthText(part.thickness, units)} thick. It has: ${have}. Pick one of those, or add this thickness to the stock room before nesting.`;
}

/** Solid wood is what the stock room holds as boards (sold by the board foot). */
export const isSolidWood = (material: string, offers: readonly StockOffer[]) => offersOf(offers, material).some((o) => o.kind === 'board');

/** The stock room's sheets and boards (any count: a size the shop keeps can be bought) and its available offcuts. */
export function toStockOffers(
  items: readonly { material: string; kind: 'sheet' | 'board'; thickness: number; nominalThickness: string }[],
  offcuts: readonly { material: string; thickness: number; status: string }[],
): StockOffer[] {
  const all: StockOffer[] = [
    ...items.map((i) => ({ material: i.material, kind: i.kind, thickness: i.thickness, nominal: i.nominalThickness })),
    ...offcuts
      .filter((o) => o.status === 'available')
      .map((o) => ({ material: o.material, kind: 'offcut' as const, thickness: o.thickness, nominal: '' })),
  ];
  // One offer per material, kind and thickness: a picker lists each once.
  const seen = new Map<string, StockOffer>();
  for (const o of all)
    seen.set(`${o.material.toLowerCase()}|${o.kind}|${o.thickness}`, seen.get(`${o.material.toLowerCase()}|${o.kind}|${o.thickness}`) ?? o);
  return [...seen.values()];
}

/** Uploaded thicknesses written as the nominal ("3/4") become the stock's actual thickness, as in the editor. */
export function snapReport(report: UploadReport, offers: readonly StockOffer[]): UploadReport {
  const snap = <T extends { part: { material: string; thickness: number } }>(r: T): T => ({
    ...r,
    part: { ...r.part, thickness: snapThickness(r.part.material, r.part.thickness, offers) },
  });
  return { ...report, valid: report.valid.map(snap), rows: report.rows.map((r) => (r.ok ? snap(r) : r)) };
}
