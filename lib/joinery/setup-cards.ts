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
