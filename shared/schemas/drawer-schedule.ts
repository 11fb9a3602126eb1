import { z } from 'zod';
import { text } from './text';
import { DRAWER_DEFAULTS as D, LIPPED_FRONT_DEFAULTS, lockRabbetFaceLeft, MAX_SCHEDULE_LENGTH_MM, SLIDE_SERIES } from '@/lib/joinery/defaults';
import { slideModelRuleSchema } from './slide-model';

/**
 * A drawer schedule: a set of identical drawer boxes. All lengths are mm. Most fields have trade defaults
 * (lib/joinery/defaults.ts), so a shop fills the label, quantity and size and may change the rest.
 */

/**
 * The most a length of each kind may be: past it a number is a slipped unit, never a drawer. No drawer box is over 3 m;
 * no part of one is 100 mm thick; no slide takes 300 mm (so a lip of a kilometre, or of a metre, is refused).
 */
const MAX = { size: MAX_SCHEDULE_LENGTH_MM, clearance: 300, small: 100 } as const;
const tooBig = (what: string, max: number) => ({ error: `${what} over ${max >= 1000 ? `${max / 1000} m` : `${max} mm`} looks like a slipped unit` });

const positiveMm = (what: string, max: number = MAX.size) =>
  z
    .number({ error: `${what} must be a length in mm` })
    .finite({ error: `${what} must be a finite length` })
    .positive({ error: `${what} must be more than 0 mm` })
    .max(max, tooBig(what, max));
const nonNegativeMm = (what: string, max: number = MAX.size) =>
  z
    .number({ error: `${what} must be a length in mm` })
    .finite({ error: `${what} must be a finite length` })
    .min(0, { error: `${what} cannot be negative` })
    .max(max, tooBig(what, max));

export const JOINT_METHODS = [
  'lock-rabbet',
  'rabbet-and-dado',
  'butt-pocket-screw',
  'butt-loose-tenon',
  'half-blind-dovetail',
  'through-dovetail',
  'box-joint',
] as const;
export const jointMethodSchema = z.enum(JOINT_METHODS);
export type JointMethod = z.infer<typeof jointMethodSchema>;

/** Which part runs through at a butt corner: the sides the full depth (A) or the front and back the full width (B). */
export const buttLayoutSchema = z.enum(['sides-full-depth', 'front-back-full-width']);

export const jointSchema = z.discriminatedUnion('method', [
  z.object({
    method: z.literal('lock-rabbet'),
    /**
     * Front/back thickness left outside the side's tongue (published articles call it the lip). Left out: it follows
     * the front's thickness (`lockRabbetFaceLeft`: ⅛″ on a ½″ front, ¼″ on a ¾″ one).
     */
    faceLeft: nonNegativeMm('Face left outside the tongue', MAX.small).optional(),
  }),
  z.object({
    method: z.literal('rabbet-and-dado'),
    dadoDepth: nonNegativeMm('Dado depth', MAX.small).default(D.dadoDepth),
    dadoWidth: positiveMm('Dado width', MAX.small).default(D.dadoWidth),
  }),
  z.object({
    method: z.literal('butt-pocket-screw'),
    layout: buttLayoutSchema.default('sides-full-depth'),
  }),
  z.object({
    method: z.literal('butt-loose-tenon'),
    layout: buttLayoutSchema.default('sides-full-depth'),
    tenonThickness: positiveMm('Tenon thickness', MAX.small).default(D.tenonThickness),
    mortiseDepth: positiveMm('Mortise depth', MAX.small).default(D.mortiseDepth),
    tenonsPerCorner: z.int().min(1).max(6).default(D.tenonsPerCorner),
  }),
  z.object({
    method: z.literal('half-blind-dovetail'),
    lap: nonNegativeMm('Lap', MAX.small).default(D.dovetailLap),
  }),
  z.object({ method: z.literal('through-dovetail') }),
  z.object({
    method: z.literal('box-joint'),
    fingerWidth: positiveMm('Finger width', MAX.small).default(D.boxJointFinger),
  }),
]);

export const SLIDE_TYPES = ['side-mount', 'undermount', 'wooden-runners', 'none'] as const;

/**
 * Ball-bearing side-mount slides come in two series: imperial (½″ per side, 12–28″ long) and metric (12.5 mm per
 * side, 250–650 mm). Left out: imperial, which is what every schedule saved before the series existed meant.
 */
export const SLIDE_SERIES_IDS = ['imperial', 'metric'] as const;
export const slideSeriesSchema = z.enum(SLIDE_SERIES_IDS, { error: 'The slide series is "imperial" or "metric".' });
export type SlideSeries = z.infer<typeof slideSeriesSchema>;

/** Slides that need a running clearance on each side and above the box. */
const clearanceSlide = <T extends 'wooden-runners' | 'none'>(type: T, side: number, height: number) =>
  z.object({
    type: z.literal(type),
    sideClearance: nonNegativeMm('Side clearance', MAX.clearance).default(side),
    heightClearance: nonNegativeMm('Height clearance', MAX.clearance).default(height),
  });

export const slideSchema = z.discriminatedUnion('type', [
  z.object({
    type: z.literal('side-mount'),
    series: slideSeriesSchema.default('imperial'),
    /** Left out: the series' clearance (½″ imperial, 12.5 mm metric). */
    sideClearance: nonNegativeMm('Side clearance', MAX.clearance).optional(),
    heightClearance: nonNegativeMm('Height clearance', MAX.clearance).optional(),
    /** A slide model from Shop settings: when given, its rule sizes the box instead of the series. */
    model: slideModelRuleSchema.optional(),
  }),
  z.object({
    type: z.literal('undermount'),
    /** A slide model from Shop settings, as the maker specifies it; when given, it sizes the box (the fields below do not). */
    model: slideModelRuleSchema.optional(),
    // Without a model (schedules saved before models existed): one deduction for every side thickness.
    widthDeduction: nonNegativeMm('Width deduction', MAX.clearance).default(D.undermountWidthDeduction),
    heightDeduction: nonNegativeMm('Height deduction', MAX.clearance).default(D.undermountHeightDeduction),
    bottomRecess: nonNegativeMm('Bottom recess', MAX.clearance).default(D.undermountBottomRecess),
  }),
  clearanceSlide('wooden-runners', D.runnerSideClearance, D.runnerHeightClearance),
  clearanceSlide('none', 0, 0),
]);

/**
 * How box depth follows from the opening. Left out: the longest standard slide of the slide's series for slides,
 * else the opening less a back clearance.
 */
export const depthRuleSchema = z.discriminatedUnion('rule', [
  z.object({
    rule: z.literal('longest-standard-slide'),
    /** Left out: the side-mount slide's series (imperial for other slides). */
    series: slideSeriesSchema.optional(),
    backClearance: nonNegativeMm('Back clearance', MAX.clearance).default(D.backClearance),
  }),
  z.object({ rule: z.literal('slide-length'), slideLength: positiveMm('Slide length') }),
  z.object({
    rule: z.literal('opening-less-clearance'),
    backClearance: nonNegativeMm('Back clearance', MAX.clearance).default(D.backClearance),
  }),
]);

export const drawerSizeSchema = z.discriminatedUnion('from', [
  z.object({
    from: z.literal('opening'),
    width: positiveMm('Opening width'),
    height: positiveMm('Opening height'),
    depth: positiveMm('Opening depth'),
    depthRule: depthRuleSchema.optional(),
  }),
  z.object({
    from: z.literal('box'),
    width: positiveMm('Box width'),
    height: positiveMm('Box height'),
    depth: positiveMm('Box depth'),
  }),
]);

export const LIP_FITS = ['overlay', 'reveal', 'lip'] as const;
export type LipFit = (typeof LIP_FITS)[number];

export const frontStyleSchema = z.discriminatedUnion('style', [
  z.object({ style: z.literal('flush') }),
  z.object({
    style: z.literal('lipped'),
    /**
     * How the lipped front meets the opening: `overlay` laps past it by `overlay` on each side (⅜″ by default, the
     * classic lipped drawer), `reveal` stops `reveal` inside it on each side (1/16″ by default); `lip` gives the lip past each side of
     * the box outright (a box-size schedule, or one saved before fits existed). Left out: `lip` when `lip` is given,
     * else `overlay`.
     */
    fit: z.enum(LIP_FITS).optional(),
    overlay: nonNegativeMm('Overlay', MAX.small).optional(),
    reveal: nonNegativeMm('Reveal', MAX.small).optional(),
    lip: positiveMm('Lip', MAX.small).optional(),
  }),
  z.object({
    style: z.literal('applied'),
    fit: z.enum(['overlay', 'inset']).default('overlay'),
    /** Overlay: how far the front laps past the opening on each edge. */
    overlay: z
      .object({
        side: nonNegativeMm('Side overlay', MAX.small).default(D.fullOverlayOn18mmCarcass),
        top: nonNegativeMm('Top overlay', MAX.small).default(D.fullOverlayOn18mmCarcass),
        bottom: nonNegativeMm('Bottom overlay', MAX.small).default(D.fullOverlayOn18mmCarcass),
      })
      .prefault({}),
    /** Inset: gap between the front and the opening on each edge. */
    reveal: nonNegativeMm('Reveal', MAX.small).default(D.frontReveal),
    thickness: positiveMm('Applied front thickness', MAX.small).default(D.appliedFrontThickness),
    material: text().min(1).max(120).default(D.appliedFrontMaterial),
    /** Explicit size; wins over the opening (and is needed when the schedule gives the box size). */
    width: positiveMm('Applied front width').optional(),
    height: positiveMm('Applied front height').optional(),
  }),
]);

export const grainRuleSchema = z.enum(['along-length', 'any']);

export const bottomSchema = z.discriminatedUnion('mount', [
  z.object({
    mount: z.literal('groove'),
    thickness: positiveMm('Bottom thickness', MAX.small).default(D.bottomThickness),
    material: text().min(1).max(120).default(D.bottomMaterial),
    grain: grainRuleSchema.default('any'),
    groove: z
      .object({
        width: positiveMm('Groove width', MAX.small).default(D.grooveWidth),
        depth: positiveMm('Groove depth', MAX.small).default(D.grooveDepth),
        /** From the box's bottom edge to the groove's lower edge. Left out: ½″, or the undermount slide's bottom recess if more. */
        height: nonNegativeMm('Groove height', MAX.clearance).optional(),
        /** Total play across the bottom, split between the two grooves it spans. */
        clearance: z
          .number({ error: 'Bottom clearance must be a length in mm' })
          .finite()
          .min(0, { error: 'Bottom clearance cannot be negative: the bottom would be wider than its grooves allow' })
          .max(MAX.small, tooBig('Bottom clearance', MAX.small))
          .default(D.bottomClearance),
      })
      .prefault({}),
  }),
  z.object({
    mount: z.literal('applied'),
    thickness: positiveMm('Bottom thickness', MAX.small).default(D.bottomThickness),
    material: text().min(1).max(120).default(D.bottomMaterial),
    grain: grainRuleSchema.default('any'),
  }),
]);

const drawerScheduleShape = z.object({
  label: text().min(1, { error: 'Give the schedule a label' }).max(80),
  quantity: z.int({ error: 'Quantity must be a whole number' }).min(1, { error: 'Quantity must be at least 1' }).max(10_000),
  size: drawerSizeSchema,
  slide: slideSchema.prefault({ type: 'side-mount' }),
  joint: jointSchema.prefault({ method: 'lock-rabbet' }),
  thickness: z
    .object({
      front: positiveMm('Front thickness', MAX.small).default(D.frontThickness),
      /** Left out: same as the front. */
      back: positiveMm('Back thickness', MAX.small).optional(),
      side: positiveMm('Side thickness', MAX.small).default(D.sideThickness),
    })
    .prefault({}),
  front: frontStyleSchema.prefault({ style: 'flush' }),
  bottom: bottomSchema.prefault({ mount: 'groove' }),
  materials: z
    .object({
      sides: text().min(1).max(120).default(D.boxMaterial),
      /** Left out: same as the sides. */
      front: text().min(1).max(120).optional(),
      /** Left out: same as the front. */
      back: text().min(1).max(120).optional(),
    })
    .prefault({}),
});

type ParsedShape = z.output<typeof drawerScheduleShape>;
type Filled<J> = J extends { method: 'lock-rabbet' } ? J & { faceLeft: number } : J;
type FilledSlide<S> = S extends { type: 'side-mount' } ? S & { sideClearance: number; heightClearance: number } : S;
type FilledFront<F> = F extends { style: 'lipped' } ? F & { fit: LipFit } : F;
type FilledBottom<B> = B extends { mount: 'groove'; groove: infer G } ? Omit<B, 'groove'> & { groove: G & { height: number } } : B;
type FilledSize<Z> = Z extends { from: 'opening'; depthRule?: infer R }
  ? Omit<Z, 'depthRule'> & { depthRule?: R extends { rule: 'longest-standard-slide' } ? R & { series: SlideSeries } : R }
  : Z;

/** A lipped front's fit, and the one amount it uses, filled. */
function fillLip(f: Extract<ParsedShape['front'], { style: 'lipped' }>) {
  const fit: LipFit = f.fit ?? (f.lip !== undefined ? 'lip' : 'overlay');
  if (fit === 'overlay') return { ...f, fit, overlay: f.overlay ?? LIPPED_FRONT_DEFAULTS.imperial.overlay };
  if (fit === 'reveal') return { ...f, fit, reveal: f.reveal ?? LIPPED_FRONT_DEFAULTS.imperial.reveal };
  return { ...f, fit };
}

/**
 * Defaults that depend on another field: a lock rabbet's face left follows the front's thickness; a side-mount
 * slide's clearances and a standard-slide depth rule's series follow the slide's series.
 */
function fillDependentDefaults(s: ParsedShape, ctx: z.RefinementCtx) {
  let joint = s.joint;
  if (s.joint.method === 'lock-rabbet' && s.joint.faceLeft === undefined) {
    try {
      joint = { ...s.joint, faceLeft: lockRabbetFaceLeft(s.thickness.front) };
    } catch (e) {
      ctx.addIssue({ code: 'custom', path: ['joint', 'faceLeft'], message: (e as Error).message });
      return z.NEVER;
    }
  }
  const slide =
    s.slide.type === 'side-mount'
      ? {
          ...s.slide,
          sideClearance: s.slide.sideClearance ?? SLIDE_SERIES[s.slide.series].sideClearance,
          heightClearance: s.slide.heightClearance ?? SLIDE_SERIES[s.slide.series].heightClearance,
        }
      : s.slide;
  const seriesOfSlide: SlideSeries = s.slide.type === 'side-mount' ? s.slide.series : 'imperial';
  const size =
    s.size.from === 'opening' && s.size.depthRule?.rule === 'longest-standard-slide' && s.size.depthRule.series === undefined
      ? { ...s.size, depthRule: { ...s.size.depthRule, series: seriesOfSlide } }
      : s.size;
  // An undermount slide's fixings sit under the bottom: the groove goes at least as high as its bottom recess.
  const recess = s.slide.type === 'undermount' ? (s.slide.model?.bottomRecess ?? s.slide.bottomRecess) : 0;
  const bottom =
    s.bottom.mount === 'groove' && s.bottom.groove.height === undefined
      ? { ...s.bottom, groove: { ...s.bottom.groove, height: Math.max(D.grooveHeight, recess) } }
      : s.bottom;
  const front = s.front.style === 'lipped' ? fillLip(s.front) : s.front;
  return {
    ...s,
    front: front as FilledFront<ParsedShape['front']>,
    bottom: bottom as FilledBottom<ParsedShape['bottom']>,
    joint: joint as Filled<ParsedShape['joint']>,
    slide: slide as FilledSlide<ParsedShape['slide']>,
    size: size as FilledSize<ParsedShape['size']>,
  };
}

export const drawerScheduleSchema = drawerScheduleShape
  .superRefine((s, ctx) => {
    if (s.front.style === 'lipped' && (s.front.fit ?? (s.front.lip !== undefined ? 'lip' : 'overlay')) === 'lip' && s.front.lip === undefined)
      ctx.addIssue({
        code: 'custom',
        path: ['front', 'lip'],
        message: 'Give the lip past each side of the box, or choose an overlay or a reveal.',
      });
    const model = s.slide.type === 'side-mount' || s.slide.type === 'undermount' ? s.slide.model : undefined;
    if (model && model.kind !== s.slide.type)
      ctx.addIssue({
        code: 'custom',
        path: ['slide', 'model', 'kind'],
        message: `${model.name} is a ${model.kind} slide, not ${s.slide.type}: choose it with ${model.kind} slides.`,
      });
  })
  .transform(fillDependentDefaults);

export type DrawerSchedule = z.output<typeof drawerScheduleSchema>;
export type DrawerScheduleInput = z.input<typeof drawerScheduleSchema>;
export type Joint = DrawerSchedule['joint'];
export type Slide = DrawerSchedule['slide'];
export type FrontStyle = DrawerSchedule['front'];
export type Bottom = DrawerSchedule['bottom'];
export type GrainRule = z.infer<typeof grainRuleSchema>;
