import { lockRabbetFenceSetback, requireStock } from '@/lib/joinery/defaults';
import { inches, type Mm } from '@/lib/units/length';
import type { DrawerSchedule } from '@/shared/schemas/drawer-schedule';
import type { SetupCard } from '@/shared/schemas/setup-card';
import type { SetupCardKey } from '@/lib/joinery/types';

/** The thinnest and thickest stock the starting rule is offered for (a lock rabbet in stock under ⅜″ or over 1″ is no drawer joint). */
const LOCK_RABBET_STOCK = { min: inches(3 / 8), max: inches(1) };

/** Thicknesses closer than this share a setup card (stock varies more than this from board to board). */
export const SETUP_CARD_TOLERANCE_MM = 0.1;

/** One card per joint and distinct stock thickness the schedule's joints are cut in, thinnest first. */
export function requiredSetupCards(schedule: Pick<DrawerSchedule, 'joint' | 'thickness'>): SetupCardKey[] {
  const { front, side } = schedule.thickness;
  const thicknesses = [requireStock('front', front), requireStock('back', schedule.thickness.back ?? front), requireStock('side', side)].sort(
    (a, b) => a - b,
  );
  const distinct = thicknesses.filter((t, i) => i === 0 || t - thicknesses[i - 1] > SETUP_CARD_TOLERANCE_MM);
  return distinct.map((stockThickness) => ({ joint: schedule.joint.method, stockThickness }));
}

/** The shop's card for a key, if it has saved one. */
export function findSetupCard(cards: readonly SetupCard[], key: SetupCardKey): SetupCard | undefined {
  requireStock('stock', key.stockThickness);
  return cards.find((c) => c.joint === key.joint && Math.abs(c.stockThickness - key.stockThickness) <= SETUP_CARD_TOLERANCE_MM);
}

/** A lock-rabbet card for stock `t` by the starting rule (`lockRabbetFenceSetback`, RULES.md); ⅜″ to 1″ stock only. */
export function lockRabbetCard(stock: Mm): SetupCard {
  requireStock('stock', stock);
  if (stock < LOCK_RABBET_STOCK.min - 1e-9 || stock > LOCK_RABBET_STOCK.max + 1e-9)
    throw new RangeError(`The lock rabbet's starting rule is for stock from ⅜″ to 1″ (9.5–25.4 mm), not ${stock} mm.`);
  return lockRabbetCardFor(stock);
}

const lockRabbetCardFor = (stock: Mm): SetupCard => ({
  joint: 'lock-rabbet',
  stockThickness: stock,
  fields: [
    // The bit height stays the same for every stock thickness; the fence moves with it [CP].
    { key: 'bit-height', label: 'Bit height', value: inches(3 / 8), unit: 'mm' },
    { key: 'fence-setback', label: 'Fence back from the cutter’s front', value: lockRabbetFenceSetback(stock), unit: 'mm' },
  ],
  note: 'Starting values (fence back half the stock plus 1/16″): make test cuts in scrap of the same thickness and adjust before cutting parts.',
});

/**
 * Starting lock-rabbet cards for the common drawer-stock thicknesses: ½″ and ¾″ [CP], ⅝″, and metric 12, 15 and
 * 18 mm by the same rule. The shop edits and saves its own.
 */
export const DEFAULT_LOCK_RABBET_CARDS: readonly SetupCard[] = [12, inches(1 / 2), 15, inches(5 / 8), 18, inches(3 / 4)].map(lockRabbetCard);

/** The starting card for a key when the shop has saved none: the lock rabbet's rule at the key's very thickness. */
export function defaultSetupCard(key: SetupCardKey): SetupCard | undefined {
  requireStock('stock', key.stockThickness);
  if (key.joint !== 'lock-rabbet') return undefined;
  if (key.stockThickness < LOCK_RABBET_STOCK.min || key.stockThickness > LOCK_RABBET_STOCK.max) return undefined;
  return lockRabbetCard(key.stockThickness);
}
