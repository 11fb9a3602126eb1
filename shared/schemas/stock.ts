/**
 * Stock room inputs: sheets and boards, counts, offcuts, CSV imports and finishing a plan. Lengths reaching the
 * API are millimetres (forms parse what people type with `lengthInput` first); money is integer cents.
 */
import { z } from 'zod';
import { text as freeText } from './text';

const text = (max: number) => freeText({ max });
const mm = (what: string) =>
  z
    .number({ error: `${what} must be a number of mm.` })
    .finite()
    .positive(`${what} must be greater than zero.`)
    .max(100_000, `${what} above 100 m looks like a typo.`);
const count = (what: string) => z.number({ error: `${what} must be a number.` }).int(`${what} must be a whole number.`);
const cents = z
  .number({ error: 'A price must be a number of cents.' })
  .int('A price is whole cents.')
  .min(0, 'A price cannot be negative.')
  .max(100_000_000);
const reason = text(500);

export const stockKindSchema = z.enum(['sheet', 'board'], { error: 'Kind is "sheet" or "board".' });
export const stockGrainSchema = z.enum(['along-length', 'none'], { error: 'Grain is "along-length" or "none".' });
export const surfacingSchema = z.enum(['', 'rough', 'S2S', 'S4S'], { error: 'Surfacing is rough, S2S or S4S.' });
export const offcutStatusSchema = z.enum(['available', 'reserved', 'used', 'scrapped']);

/** A sheet or board size on the rack (or in the catalogue of sizes the shop can buy, `buyable`). */
export const stockItemSchema = z.object({
  kind: stockKindSchema,
  material: text(200).min(1, 'Material is required.'),
  nominalThickness: text(40).min(1, 'Say what the shop calls the thickness (3/4", 18 mm, 4/4).'),
  thickness: mm('Thickness'),
  length: mm('Length'),
  width: mm('Width'),
  grain: stockGrainSchema.default('along-length'),
  surfacing: surfacingSchema.default(''),
  grade: text(60).default(''),
  onHand: count('On hand').min(0, 'On hand cannot be negative.').max(100_000).default(0),
  lowStockAt: count('Low-stock mark').min(0).max(100_000).default(0),
  /** Sheets: each. Boards: per board foot. */
  costCents: cents.default(0),
  supplier: text(200).default(''),
  location: text(120).default(''),
  buyable: z.boolean().default(false),
});
export type StockItemInput = z.input<typeof stockItemSchema>;
export type StockItemValues = z.infer<typeof stockItemSchema>;

const fixed = (message: string) => z.never({ error: message }).optional();
const sizeIsFixed = fixed('Length, width, thickness and grain define a stock size; add a new size for a different one.');
const { shape } = stockItemSchema;

/**
 * Details an owner may change later: only the fields sent change (no defaults here, so a one-field change leaves the
 * rest alone). Counts change only through receive / adjust so the ledger stays whole; the size itself (kind,
 * length, width, thickness, grain) is what plans were nested on, so a different size is a new stock size.
 */
export const stockItemPatchSchema = z.strictObject({
  material: shape.material.optional(),
  nominalThickness: shape.nominalThickness.optional(),
  surfacing: surfacingSchema.optional(),
  grade: shape.grade.unwrap().optional(),
  lowStockAt: shape.lowStockAt.unwrap().optional(),
  /** Sheets: each. Boards: per board foot. */
  costCents: cents.optional(),
  supplier: shape.supplier.unwrap().optional(),
  location: shape.location.unwrap().optional(),
  buyable: z.boolean().optional(),
  kind: fixed('A sheet stays a sheet and a board a board; add a new size instead.'),
  onHand: fixed('Counts change by receiving or adjusting, so the history behind them stays whole.'),
  thickness: sizeIsFixed,
  length: sizeIsFixed,
  width: sizeIsFixed,
  grain: sizeIsFixed,
});
export type StockItemPatch = z.infer<typeof stockItemPatchSchema>;
/** The fields a patch may change, in the order people read them. */
export const STOCK_DETAIL_FIELDS = [
  'material',
  'nominalThickness',
  'surfacing',
  'grade',
  'costCents',
  'supplier',
  'location',
  'lowStockAt',
  'buyable',
] as const;
export type StockDetailField = (typeof STOCK_DETAIL_FIELDS)[number];

export const receiveStockSchema = z.strictObject({
  quantity: count('Quantity').min(1, 'Receive at least one.').max(100_000),
  reason: reason.default(''),
});

/** A counted figure replaces the book count; the difference is recorded with the reason. */
export const adjustStockSchema = z.strictObject({
  count: count('The count').min(0, 'A count cannot be negative.').max(100_000),
  reason: reason.min(1, 'Say why the count changed (counted, damaged, found…).'),
});

export const recordOffcutSchema = z.strictObject({
  material: text(200).min(1, 'Material is required.'),
  thickness: mm('Thickness'),
  length: mm('Length'),
  width: mm('Width'),
  grain: stockGrainSchema.default('along-length'),
  location: text(120).default(''),
});

export const scrapOffcutSchema = z.strictObject({ reason: reason.default('') });

export const stockFilterSchema = z.object({
  kind: stockKindSchema.optional().catch(undefined),
  material: text(200).optional(),
  /** Matches the nominal thickness as the shop writes it ("3/4\"", "4/4"). */
  thickness: text(40).optional(),
  location: text(120).optional(),
  status: offcutStatusSchema.optional().catch(undefined),
});
export type StockFilter = z.infer<typeof stockFilterSchema>;

export const importStockSchema = z.strictObject({
  csv: z.string().min(1, 'The file is empty.').max(1_000_000, 'A stock file above 1 MB is too large to import at once.'),
  /** `none` checks only; `all` writes only when every row is valid; `valid` writes the valid rows and skips the rest. */
  commit: z.enum(['none', 'all', 'valid']).default('none'),
});

/** Finishing a plan: where each kept offcut goes, which to discard, and parts damaged at the saw. Never costs. */
export const finishPlanSchema = z.strictObject({
  offcuts: z
    .array(
      z.strictObject({
        piece: count('Piece').min(0),
        index: count('Offcut').min(0),
        keep: z.boolean().default(true),
        location: text(120).default(''),
      }),
    )
    .max(5000)
    .default([]),
  /** Each damaged part goes on the job's re-cut list with its reason (a default one when none is given). */
  damaged: z
    .array(
      z.strictObject({ piece: count('Piece').min(0), partId: text(100).min(1), instance: count('Instance').min(1), reason: text(200).default('') }),
    )
    .max(5000)
    .default([]),
});
export type FinishPlanInput = z.input<typeof finishPlanSchema>;
export type FinishPlanChoices = z.output<typeof finishPlanSchema>;

/** A piece a release needed that is no longer free (the 409 answer lists each). */
export interface MissingPiece {
  stockId: string;
  kind: 'sheet' | 'board' | 'offcut';
  material: string;
  thickness: number;
  length: number;
  width: number;
  needed: number;
  free: number;
}
