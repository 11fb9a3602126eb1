import { labourLines, type LabourCounts } from '@/lib/costing/labour';
import type { TakeoffLine } from '@/lib/stock/takeoff';
import type { HardwareItem, PricingSettings } from '@/shared/schemas/pricing';
import type { QuoteLine } from '@/shared/schemas/quote';

/** A pair of drawer slides of one length, as the drawer schedules ask for them. */
export interface SlideNeed {
  /** "Side-mount slides" or the model's name. */
  kind: string;
  length: number;
  /** The length as the shop reads it (18″, 450 mm). */
  lengthText: string;
  pairs: number;
}

export interface QuoteSources {
  /** The chosen plan's takeoff: stock to pull and to buy, offcuts among them; null for a quote without a plan. */
  takeoff: { lines: TakeoffLine[]; allowancePercent: number; allowanceCents: number } | null;
  slides: SlideNeed[];
  counts: LabourCounts;
  pricing: PricingSettings;
  hardware: HardwareItem[];
  /** A stock size as the shop reads it: "Maple ply 23/32″, 96″ × 48″". */
  describeSize: (line: TakeoffLine) => string;
}

const LABOUR_TEXT = {
  saw: (c: LabourCounts) =>
    `Saw time: ${c.cuts} cut${c.cuts === 1 ? '' : 's'}, ${c.piecesHandled} stock piece${c.piecesHandled === 1 ? '' : 's'} handled`,
  machining: (c: LabourCounts) =>
    `Machining: ${c.setupCards} setup${c.setupCards === 1 ? '' : 's'}, ${c.jointCorners} joint corner${c.jointCorners === 1 ? '' : 's'}`,
  assembly: (c: LabourCounts) => `Assembly: ${c.drawerBoxes} drawer box${c.drawerBoxes === 1 ? '' : 'es'}`,
  finishing: () => 'Finishing',
} as const;

/** The price-list item for slides of a length: a "pair" item whose name holds the length as the shop writes it. */
export function slidePrice(need: SlideNeed, hardware: readonly HardwareItem[]): HardwareItem | undefined {
  const needle = need.lengthText.replace(/\s+/g, '').toLowerCase();
  return hardware.find(
    (h) => h.unit.trim().toLowerCase() === 'pair' && /slide/i.test(h.name) && h.name.replace(/\s+/g, '').toLowerCase().includes(needle),
  );
}

/**
 * A new quote's lines from the job: material from the plan's takeoff (each size to pull or to buy at cost; offcuts at
 * the offcut valuation) plus the spoilage allowance once; drawer slides as pairs by length at the price list's price;
 * labour from the counts at the shop's rates, hours shown. Every line is the estimator's to change afterwards.
 */
export function buildQuoteLines(src: QuoteSources): QuoteLine[] {
  const { pricing } = src;
  const lines: QuoteLine[] = [];
  let n = 0;
  const id = (kind: string) => `${kind}-${++n}`;
  for (const t of src.takeoff?.lines ?? []) {
    const offcut = t.source === 'offcut';
    const free = offcut && pricing.offcutValuation === 'free';
    lines.push({
      id: id('m'),
      kind: 'material',
      description: `${src.describeSize(t)}${offcut ? ' (offcut from the rack)' : t.source === 'buy' ? ' (to buy)' : ' (from stock)'}`,
      quantity: t.count,
      unit: offcut ? 'offcut' : t.kind === 'board' ? 'board' : 'sheet',
      unitCostMinor: free ? 0 : t.costEachCents,
      taxable: pricing.taxable.material,
      note: free ? 'Offcuts are quoted free (Shop settings → Pricing).' : offcut ? 'At area cost: its share of the stock it came from.' : '',
    });
  }
  if (src.takeoff && src.takeoff.allowanceCents > 0) {
    lines.push({
      id: id('m'),
      kind: 'material',
      description: `Spoilage allowance (${src.takeoff.allowancePercent} % of material, once)`,
      quantity: 1,
      unit: 'lot',
      unitCostMinor: src.takeoff.allowanceCents,
      taxable: pricing.taxable.material,
      note: 'From the takeoff: extra material for parts spoiled at the saw and for defects.',
    });
  }
  for (const s of [...src.slides].sort((a, b) => a.kind.localeCompare(b.kind) || a.length - b.length)) {
    const item = slidePrice(s, src.hardware);
    lines.push({
      id: id('h'),
      kind: 'hardware',
      description: item ? item.name : `${s.kind}, ${s.lengthText}`,
      quantity: s.pairs,
      unit: 'pair',
      unitCostMinor: item?.priceMinor ?? 0,
      taxable: pricing.taxable.hardware,
      note: item ? 'From the drawer schedules, priced from the price list.' : `No ${s.lengthText} slides on the price list: give them a price.`,
    });
  }
  for (const l of labourLines(src.counts, pricing)) {
    if (l.hours === 0) continue;
    lines.push({
      id: id('l'),
      kind: 'labour',
      description: l.kind === 'finishing' ? `Finishing: ${l.areaM2} m² of faces` : LABOUR_TEXT[l.kind](src.counts),
      quantity: l.hours,
      unit: 'h',
      unitCostMinor: pricing.hourlyRateMinor[l.kind],
      taxable: pricing.taxable.labour,
      note: `${(l.centiMinutes / 100).toLocaleString('en-US')} min → ${l.hours.toFixed(2)} h (to the nearest 0.01 h, halves up).`,
    });
  }
  return lines;
}
