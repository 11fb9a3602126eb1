import { inches, type Mm } from '@/lib/units/length';

/**
 * Editable defaults for drawer schedules. Conventions of the trade, not standards: every one can be changed per
 * schedule. Sources as in RULES.md: [CP] = common practice, no source; "from memory" where it is.
 */
export const DRAWER_DEFAULTS = {
  frontThickness: inches(3 / 4), // ¾″ box front with ½″ sides is common [CP]
  sideThickness: inches(1 / 2), // [CP]

  // Side-mount ball-bearing slides: see SLIDE_SERIES below (½″ imperial, 12.5 mm metric, per side and above).
  // Undermount: ≈ ⅝″ total width deduction with ½″ sides and a ½″ bottom recess [CP]; check the maker's spec.
  undermountWidthDeduction: inches(5 / 8),
  undermountHeightDeduction: inches(1), // [CP, from memory]
  undermountBottomRecess: inches(1 / 2),
  // Wooden runners: a small running clearance [CP, from memory].
  runnerSideClearance: 1,
  runnerHeightClearance: 3,
  // Room behind the box in the carcass [CP, from memory].
  backClearance: inches(1 / 2),

  // Lock rabbet: a bit cutting ⅜″ into ½″ stock leaves ⅛″ of the front's face outside the side's tongue [CP]; other
  // fronts follow `lockRabbetFaceLeft` below.
  lockRabbetFaceLeft: inches(1 / 8),
  // Rabbet and dado: ¼″ × ¼″ dado in ½″ sides (Woodsmith tip).
  dadoDepth: inches(1 / 4),
  dadoWidth: inches(1 / 4),
  // Loose tenons [CP, from memory].
  tenonThickness: inches(1 / 4),
  mortiseDepth: inches(5 / 16),
  tenonsPerCorner: 2,
  // Half-blind dovetail: 3/16″ lap on a ¾″ front (Fine Woodworking).
  dovetailLap: inches(3 / 16),
  boxJointFinger: inches(1 / 4), // [CP]

  // Applied fronts: frameless reveal 1.5 mm per side, 3 mm between fronts [CP]; full overlay on 18 mm carcass
  // sides therefore laps 18 − 1.5 = 16.5 mm past the opening [derived].
  appliedFrontThickness: inches(3 / 4),
  frontReveal: 1.5,
  fullOverlayOn18mmCarcass: 18 - 1.5,

  // Bottom captured in a ¼ × ¼″ groove, ½″ up, 1/16″ total clearance [CP]; ¼″ plywood bottom.
  bottomThickness: inches(1 / 4),
  grooveWidth: inches(1 / 4),
  grooveDepth: inches(1 / 4),
  grooveHeight: inches(1 / 2),
  bottomClearance: inches(1 / 16),

  boxMaterial: 'drawer-box stock',
  bottomMaterial: 'plywood',
  appliedFrontMaterial: 'drawer-front stock',
} as const satisfies Record<string, Mm | string>;

/**
 * A lipped box front's fit on the opening when none is given: an overlay of ⅜″ each side, as the classic lipped drawer
 * laps its face frame [CP] (10 mm in a metric shop), or a reveal of 1/16″ (1.5 mm metric, the frameless reveal) [CP].
 */
export const LIPPED_FRONT_DEFAULTS = {
  imperial: { overlay: inches(3 / 8), reveal: inches(1 / 16) },
  metric: { overlay: 10, reveal: 1.5 },
} as const satisfies Record<'imperial' | 'metric', { overlay: Mm; reveal: Mm }>;

/** The most any length of a drawer schedule may be: no drawer box is over 3 m, so more is a slipped unit. */
export const MAX_SCHEDULE_LENGTH_MM = 3000;

/** Thinnest stock common pocket-screw jigs are set for [CP, from memory]. */
export const POCKET_SCREW_MIN_STOCK: Mm = inches(1 / 2);

/** Thickest sides undermount slides are usually made for, 16 mm (⅝″ is 15.9) [CP, from memory]. */
export const UNDERMOUNT_MAX_SIDE: Mm = 16;

/** Standard ball-bearing slide lengths, 12–28″ in 2″ steps [CP]. */
export const IMPERIAL_SLIDE_LENGTHS: readonly Mm[] = [12, 14, 16, 18, 20, 22, 24, 26, 28].map(inches);

/** Metric slide lengths, 250–650 mm in 50 mm steps [CP, from memory]. */
export const METRIC_SLIDE_LENGTHS: readonly Mm[] = [250, 300, 350, 400, 450, 500, 550, 600, 650];

/**
 * Side-mount ball-bearing slides by series: imperial slides want ½″ (12.7 mm) per side and ½″ above the box, in
 * lengths of 12–28″ [CP]; metric slides the metric half inch, 12.5 mm, in lengths of 250–650 mm [CP, from memory].
 */
export const SLIDE_SERIES = {
  imperial: { name: 'imperial', sideClearance: inches(1 / 2), heightClearance: inches(1 / 2), lengths: IMPERIAL_SLIDE_LENGTHS },
  metric: { name: 'metric', sideClearance: 12.5, heightClearance: 12.5, lengths: METRIC_SLIDE_LENGTHS },
} as const satisfies Record<'imperial' | 'metric', { name: string; sideClearance: Mm; heightClearance: Mm; lengths: readonly Mm[] }>;

/**
 * The lock rabbet's starting setup for a stock thickness t, with the bit height fixed at ⅜″: a ½″ front keeps ⅛″ of
 * its face outside the side's tongue [CP] and a ¾″ front ¼″ (Woodsmith, "Locking rabbet joint"), and the fence sits
 * 5/16″ and 7/16″ back [CP]. One straight line runs through both: face left = t/2 − ⅛″, fence setback = t/2 + 1/16″
 * (so 12 mm stock gets 2.83 mm and 7.59 mm, 18 mm gets 5.83 and 10.59). Starting points, to check on scrap.
 */
export function lockRabbetFaceLeft(front: Mm): Mm {
  requireStock('front', front);
  // ¼″ or thinner leaves no face at all: the ⅜″ cut would go through.
  if (front <= inches(1 / 4))
    throw new RangeError(
      `A ${front} mm front is too thin for a lock rabbet's starting rule (it needs more than ¼″, 6.35 mm): give the face left outright, or use thicker stock.`,
    );
  return settle(front / 2 - inches(1 / 8));
}
export const lockRabbetFenceSetback = (stock: Mm): Mm => settle(requireStock('stock', stock) / 2 + inches(1 / 16));

/** A stock thickness a rule can be figured for: finite, more than 0 and no more than 100 mm. */
export function requireStock(what: string, mm: Mm): Mm {
  if (typeof mm !== 'number' || !Number.isFinite(mm) || mm <= 0 || mm > 100)
    throw new RangeError(`The ${what} thickness must be a length from 0 to 100 mm (got ${String(mm)}).`);
  return mm;
}

/** Drops float crumbs (6.349999999999999 for 6.35) to a millionth of a millimetre. */
const settle = (mm: number) => Math.round(mm * 1e6) / 1e6;
