import { z } from 'zod';
import { text } from './text';

/**
 * A drawer slide as its maker specifies it, kept per shop in Shop settings. Boxes on the slide are sized from it:
 * the width by the maker's rule, the height by its clearance, the length by the longest length it is made in that
 * fits the opening less its rear clearance. All lengths are mm.
 */
export const SLIDE_MODEL_KINDS = ['undermount', 'side-mount'] as const;
export type SlideModelKind = (typeof SLIDE_MODEL_KINDS)[number];

/**
 * Makers give the width one of two ways: the drawer's inside width (between the sides) or its outside width, each as
 * the opening less a fixed amount.
 */
export const SLIDE_WIDTH_RULES = ['inside', 'outside'] as const;
export type SlideWidthRule = (typeof SLIDE_WIDTH_RULES)[number];

/** Sides thicker than the model allows by more than this are refused (16 mm sides on a ⅝″ slide are fine). */
export const SLIDE_SIDE_TOLERANCE_MM = 0.15;

const mm = (what: string, min: number, max: number) =>
  z
    .number({ error: `${what} must be a length in mm.` })
    .finite(`${what} must be a finite length.`)
    .min(min, min === 0 ? `${what} cannot be negative.` : `${what} must be at least ${min} mm.`)
    .max(max, `${what} over ${max} mm looks like a slipped unit.`);

export const slideModelSchema = z.object({
  kind: z.enum(SLIDE_MODEL_KINDS, { error: 'The kind is "undermount" or "side-mount".' }),
  name: text().min(1, 'Name the slide model.').max(80, 'At most 80 characters.'),
  /** The lengths the slide is made in; a box on it is as long as its slide. */
  lengths: z
    .array(mm('A slide length', 100, 1500))
    .min(1, 'Give at least one length the slide is made in.')
    .max(30, 'At most 30 lengths.')
    .transform((lengths) => [...lengths].sort((a, b) => a - b))
    .refine((lengths) => lengths.every((l, i) => i === 0 || l - lengths[i - 1] > 0.01), 'Give each length once.'),
  widthRule: z.enum(SLIDE_WIDTH_RULES, { error: 'The width rule is "inside" or "outside".' }),
  /** Inside rule: inside width = opening − this. Outside rule: box width = opening − this. */
  widthDeduction: mm('The width deduction', 0, 150),
  /** The thickest drawer side the slide is made for; null when the maker sets none. */
  maxSideThickness: mm('The thickest side', 3, 50).nullable().default(null),
  /** Undermount: how far the bottom's underside sits above the sides' bottom edge, at least. */
  bottomRecess: mm('The bottom recess', 0, 50).default(0),
  /** Opening height − box height. */
  heightClearance: mm('The height clearance', 0, 150),
  /** Room the slide needs behind its length: it fits when its length ≤ opening depth − this. */
  rearClearance: mm('The rear clearance', 0, 150),
});

export type SlideModel = z.output<typeof slideModelSchema>;
export type SlideModelInput = z.input<typeof slideModelSchema>;

/**
 * The model as a drawer schedule carries it: its whole rule, so a saved schedule sizes the same after the shop edits
 * or deletes the model; `id` names the model it came from.
 */
export const slideModelRuleSchema = slideModelSchema.extend({ id: z.uuid().optional() });
export type SlideModelRule = z.output<typeof slideModelRuleSchema>;
