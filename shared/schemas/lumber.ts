import { z } from 'zod';
import { SPECIES_IDS } from '@/lib/lumber/species';
import type { LengthUnit } from '@/lib/units/parse-length';
import { lengthInput } from './units';

const positiveMm = (what: string) =>
  z
    .number({ error: `${what} must be a number of mm.` })
    .finite(`${what} must be finite.`)
    .positive(`${what} must be greater than zero.`);

/**
 * Rough hardwood is sold by quarters of an inch (4/4 = 1″, 5/4 = 1¼″, 8/4 = 2″); surfaced or metric
 * stock by its measured thickness.
 */
export const thicknessSchema = z.union(
  [
    z.object({ quarters: z.number().int('Quarters are whole numbers (5 for 5/4).').min(1, 'At least 1/4.').max(48, 'At most 48/4 (12″).') }).strict(),
    z.object({ mm: positiveMm('The thickness') }).strict(),
  ],
  { error: 'Give the thickness as { quarters } (5 for 5/4) or { mm }.' },
);
export type Thickness = z.infer<typeof thicknessSchema>;

const QUARTERS = /^\s*(\d+)\s*\/\s*4\s*$/;

/** A thickness field: "5/4" is quarters; anything else is a length in the shop's unit. */
export const thicknessInput = (unit: LengthUnit) =>
  z.union([z.string(), z.number()], { error: 'Enter a thickness.' }).transform((value, ctx): Thickness => {
    const quarters = typeof value === 'string' ? QUARTERS.exec(value) : null;
    const parsed = quarters
      ? thicknessSchema.safeParse({ quarters: Number(quarters[1]) })
      : lengthInput(unit)
          .transform((mm) => ({ mm }))
          .safeParse(value);
    if (parsed.success) return parsed.data;
    for (const issue of parsed.error.issues) ctx.addIssue({ code: 'custom', message: issue.message, input: value });
    return z.NEVER;
  });

export const boardSchema = z.object({
  thickness: thicknessSchema,
  width: positiveMm('The width'),
  length: positiveMm('The length'),
});
export type Board = z.infer<typeof boardSchema>;

/** Waste as a fraction of what is bought: 0.3 means 30 % ends up as offcuts, defects and sawdust. */
export const wasteFactorSchema = z
  .number({ error: 'The waste factor must be a number.' })
  .min(0, 'The waste factor cannot be negative.')
  .lt(1, 'The waste factor is a fraction below 1 (0.3 for 30 %).');

export const buyQuantityInputSchema = z.object({
  need: z.number().finite().min(0, 'The quantity needed cannot be negative.'),
  waste: wasteFactorSchema,
  step: z.number().finite().positive('The buying step must be greater than zero.').optional(),
});
export type BuyQuantityInput = z.infer<typeof buyQuantityInputSchema>;

export const boardCostInputSchema = z.object({
  board: boardSchema,
  pricePerBoardFoot: z.number().finite().min(0, 'A price cannot be negative.'),
});
export type BoardCostInput = z.infer<typeof boardCostInputSchema>;

export const speciesIdSchema = z.enum(SPECIES_IDS, { error: `Species must be one of: ${SPECIES_IDS.join(', ')}.` });

/**
 * Flatsawn boards move by the tangential coefficient across their width; quartersawn and riftsawn by the radial one
 * (the handbook gives none for rift, which moves a little more than quartersawn: a low estimate).
 */
export const SAWN_CUTS = ['flatsawn', 'quartersawn', 'riftsawn'] as const;
export const sawnCutSchema = z.enum(SAWN_CUTS, { error: 'The cut is "flatsawn", "quartersawn" or "riftsawn".' });
export type SawnCut = z.infer<typeof sawnCutSchema>;

/** Percent moisture content; past roughly 30 % (fibre saturation) wood stops shrinking or swelling. */
export const moistureContentSchema = z
  .number({ error: 'Moisture content must be a number (percent).' })
  .min(0, 'Moisture content cannot be negative.')
  .max(30, 'Moisture content above 30 % is past fibre saturation: wood does not move there.');

export const movementInputSchema = z.object({
  species: speciesIdSchema,
  width: positiveMm('The width'),
  cut: sawnCutSchema,
  mcFrom: moistureContentSchema,
  mcTo: moistureContentSchema,
  /** Glued or screwed across its width (a bottom nailed on all sides, a glued-in panel): it cannot move freely. */
  fixedAcrossWidth: z.boolean(),
  threshold: positiveMm('The threshold').optional(),
});
export type MovementInput = z.infer<typeof movementInputSchema>;
