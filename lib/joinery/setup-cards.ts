import { inches, type Mm } from '@/lib/units/length';
import type { DrawerSchedule } from '@/shared/schemas/drawer-schedule';
import type { SetupCard } from '@/shared/schemas/setup-card';
import type { SetupCardKey } from '@/lib/joinery/types';

/** Thicknesses closer than this share a setup card (stock varies more than this from board to board). */
export const SETUP_CARD_TOLERANCE_MM = 0.1;

/** One card per joint and distinct stock thickness the schedule's joints are cut in, thinnest first. */
export function requiredSetupCards(schedule: Pick<DrawerSchedule, 'joint' | 'thickness'>): SetupCardKey[] {
  const { frontMm, sideMm } = schedule.thickness;
  const thicknesses = [frontMm, schedule.thickness.backMm ?? frontMm, sideMm].sort((a, b) => a - b);
  const distinct = thicknesses.filter((t, i) => i === 0 || t - thicknesses[i - 1] > SETUP_CARD_TOLERANCE_MM);
  return distinct.map((stockThicknessMm) => ({ joint: schedule.joint.method, stockThicknessMm }));
}

/** The shop's card for a key, if it has saved one. */
export function findSetupCard(cards: readonly SetupCard[], key: SetupCardKey): SetupCard | undefined {
  return cards.find((c) => c.joint === key.joint && Math.abs(c.stockThicknessMm - key.stockThicknessMm) <= SETUP_CARD_TOLERANCE_MM);
}

const lockRabbetCard = (stock: Mm, fenceSetback: Mm): SetupCard => ({
  joint: 'lock-rabbet',
  stockThicknessMm: stock,
  fields: [
    // The bit height stays the same for every stock thickness; the fence moves with it [CP].
    { key: 'bit-height', label: 'Bit height', value: inches(3 / 8), unit: 'mm' },
    { key: 'fence-setback', label: 'Fence back from the cutter’s front', value: fenceSetback, unit: 'mm' },
  ],
  note: 'Starting values: make test cuts in scrap of the same thickness and adjust before cutting parts.',
});

/** Starting lock-rabbet cards for ½″ and ¾″ stock [CP]; the shop edits and saves its own. */
export const DEFAULT_LOCK_RABBET_CARDS: readonly SetupCard[] = [
  lockRabbetCard(inches(1 / 2), inches(5 / 16)),
  lockRabbetCard(inches(3 / 4), inches(7 / 16)),
];

/**
 * A default card covers stock within this much of its thickness: metric 12 mm and ½″ (12.7 mm) stock, or 18 mm and
 * ¾″, start from the same setup and are tuned with test cuts (common practice, no source).
 */
export const DEFAULT_CARD_REACH_MM = 1.1;

/** The starting card for a key when the shop has saved none: the nearest default within reach, set to the key's stock. */
export function defaultSetupCard(key: SetupCardKey): SetupCard | undefined {
  const near = DEFAULT_LOCK_RABBET_CARDS.filter((c) => c.joint === key.joint && Math.abs(c.stockThicknessMm - key.stockThicknessMm) <= DEFAULT_CARD_REACH_MM);
  const nearest = near.sort((a, b) => Math.abs(a.stockThicknessMm - key.stockThicknessMm) - Math.abs(b.stockThicknessMm - key.stockThicknessMm))[0];
  return nearest && { ...nearest, stockThicknessMm: key.stockThicknessMm };
}
