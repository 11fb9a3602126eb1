/**
 * Nesting: the request the engine takes (`nestRequestSchema`) and the plan it returns (`planSchema`).
 * Every length is in mm (see `lib/units/length.ts`). Worker messages, route handlers and saved plans reuse these.
 */
import { z } from 'zod';
import { text } from './text';
import { nestSawSchema } from './saw';

const mm = z.number().finite();
const positiveMm = mm.positive();
const id = text().min(1, 'an id is required').max(100);

/** `along-length`: the part's length must run with the stock's grain; `any`: it may turn. */
export const grainRuleSchema = z.enum(['along-length', 'any']);
export type GrainRule = z.infer<typeof grainRuleSchema>;

export const nestPartSchema = z.object({
  id,
  label: text().max(200).default(''),
  quantity: z.number().int('quantity must be a whole number').min(1, 'quantity must be at least 1').max(100_000),
  /** Along the grain, joint allowance included. */
  length: positiveMm,
  width: positiveMm,
  thickness: positiveMm,
  material: text().min(1, 'material is required').max(200),
  // Safe default: a grained part is never turned unless someone says it may be.
  grain: grainRuleSchema.default('along-length'),
  /** Already included in `length`; carried for display. */
  jointAllowance: mm.min(0).default(0),
  /** Drawer schedule id or colour key. */
  group: text().max(100).optional(),
  notes: text({ multiline: true }).max(2000).optional(),
});
export type NestPart = z.infer<typeof nestPartSchema>;

export const stockKindSchema = z.enum(['sheet', 'board', 'offcut']);
export type StockKind = z.infer<typeof stockKindSchema>;

export const nestStockSchema = z
  .object({
    id,
    kind: stockKindSchema,
    length: positiveMm,
    width: positiveMm,
    thickness: positiveMm,
    material: text().min(1, 'material is required').max(200),
    grain: z.enum(['along-length', 'none']).default('along-length'),
    /** On hand; `null` = a size the shop can buy as many of as needed. */
    count: z.number().int('count must be a whole number').min(0).nullable(),
    costEach: mm.min(0).default(0),
    /** Offcuts only: edges already sawn, so no trim is taken (default true for offcuts). */
    trimmed: z.boolean().optional(),
    source: text().max(200).optional(),
  })
  .refine((s) => s.kind !== 'offcut' || s.count !== null, {
    message: 'an offcut is a piece on the rack: give its count (it cannot be bought)',
    path: ['count'],
  });
export type NestStock = z.infer<typeof nestStockSchema>;

export const cuttingStyleSchema = z.enum(['panel', 'strips']);
export const objectiveSchema = z.enum(['cost', 'pieces', 'cuts']);

/** 1″ (25.4 mm) between blade and fence, the least a table-saw rip should leave there (common practice, no source). */
export const DEFAULT_MIN_FENCE_WIDTH = 25.4;

/** The settings' fields (without the rules across them: `nestSettingsSchema`). */
export const nestSettingsObjectSchema = z.object({
  kerf: mm.min(0).max(20).default(3.2),
  /** Per side, kerf included, taken from factory edges (sheets, boards) only. */
  trim: mm.min(0).max(100).default(0),
  minOffcutLength: mm.min(0).default(300),
  minOffcutWidth: mm.min(0).default(100),
  style: cuttingStyleSchema.default('panel'),
  objective: objectiveSchema.default('cost'),
  timeBudgetMs: z.number().int().min(0).max(120_000).default(2000),
  seed: z.number().int().default(1),
  preferOffcuts: z.boolean().default(true),
  /**
   * The narrowest strip a rip may leave between blade and fence: 1″ on a table saw (common practice, no source; the
   * saw's manual decides). 0 turns the rule off.
   */
  minFenceWidth: mm.min(0).max(300).default(DEFAULT_MIN_FENCE_WIDTH),
  /**
   * The saw the plan is cut on (lib/nesting/saw-profile.ts): its stages and first direction bound the cut tree, and
   * every saw-order step keeps within its capacities and safe minimum. Without one, `style` decides the stages.
   */
  saw: nestSawSchema.optional(),
  /** A saw that breaks the stock down first (a track saw): the cuts `saw` cannot make are made on it. */
  breakdownSaw: nestSawSchema.optional(),
});

export const nestSettingsSchema = nestSettingsObjectSchema.superRefine((s, ctx) => {
  if (s.breakdownSaw && !s.saw)
    ctx.addIssue({ code: 'custom', message: 'a breakdown saw needs a second saw for the rest of the cuts', path: ['breakdownSaw'] });
  if (s.breakdownSaw && s.saw && s.breakdownSaw.name.toLowerCase() === s.saw.name.toLowerCase()) {
    ctx.addIssue({
      code: 'custom',
      message: 'the breakdown saw and the second saw need different names (the saw order names them)',
      path: ['breakdownSaw', 'name'],
    });
  }
});
export type NestSettings = z.infer<typeof nestSettingsSchema>;

function uniqueIds(list: { id: string }[], what: string, ctx: z.RefinementCtx, path: string) {
  const seen = new Set<string>();
  list.forEach((item, i) => {
    if (seen.has(item.id)) ctx.addIssue({ code: 'custom', message: `duplicate ${what} id "${item.id}"`, path: [path, i, 'id'] });
    seen.add(item.id);
  });
}

/** More part instances than this in one request is surely a typing slip (or more than one Nest should carry). */
export const MAX_PART_INSTANCES = 20_000;

export const nestRequestSchema = z
  .object({
    parts: z.array(nestPartSchema).max(5000),
    stock: z.array(nestStockSchema).max(1000),
    settings: nestSettingsSchema.prefault({}),
  })
  .superRefine((r, ctx) => {
    uniqueIds(r.parts, 'part', ctx, 'parts');
    uniqueIds(r.stock, 'stock', ctx, 'stock');
    const instances = r.parts.reduce((n, p) => n + p.quantity, 0);
    if (instances > MAX_PART_INSTANCES) {
      ctx.addIssue({ code: 'custom', message: `${instances} parts in all; one Nest takes at most ${MAX_PART_INSTANCES}`, path: ['parts'] });
    }
  });
export type NestRequest = z.infer<typeof nestRequestSchema>;
export type NestRequestInput = z.input<typeof nestRequestSchema>;

// ---------------------------------------------------------------- the plan

export const rectSchema = z.object({ x: mm, y: mm, w: mm.min(0), h: mm.min(0) });

/** One part instance on a stock piece, in stock coordinates (x along the stock's length). */
export const placementSchema = z.object({
  partId: id,
  /** 1-based: instance k of the part's quantity. */
  instance: z.number().int().min(1),
  label: text().default(''),
  x: mm,
  y: mm,
  /** Extent along x (the stock's length): the part's length unless rotated. */
  w: positiveMm,
  /** Extent along y. */
  h: positiveMm,
  rotated: z.boolean(),
  /** Pinned on the layout bench: a re-nest leaves it where it is. Optional, so earlier version-1 plans still read. */
  locked: z.boolean().optional(),
});
export type Placement = z.infer<typeof placementSchema>;

/** Same shape as `CutNode` in `lib/nesting/pack/types.ts`; an item's `itemId` is its placement index in the piece. */
export type PlanCutNode =
  | { type: 'item'; rect: z.infer<typeof rectSchema>; itemId: number; rotated: boolean }
  | { type: 'leftover'; rect: z.infer<typeof rectSchema> }
  | {
      type: 'cut';
      rect: z.infer<typeof rectSchema>;
      axis: 'x' | 'y';
      pos: number;
      kerf: number;
      children: [PlanCutNode] | [PlanCutNode, PlanCutNode];
    };

export const cutNodeSchema: z.ZodType<PlanCutNode> = z.lazy(() =>
  z.discriminatedUnion('type', [
    z.object({ type: z.literal('item'), rect: rectSchema, itemId: z.number().int().min(0), rotated: z.boolean() }),
    z.object({ type: z.literal('leftover'), rect: rectSchema }),
    z.object({
      type: z.literal('cut'),
      rect: rectSchema,
      axis: z.enum(['x', 'y']),
      pos: mm,
      kerf: mm.min(0),
      children: z.union([z.tuple([cutNodeSchema]), z.tuple([cutNodeSchema, cutNodeSchema])]),
    }),
  ]),
);

export const sawPieceSchema = rectSchema.extend({
  name: text().min(1),
  /** `part`: exactly one part; `piece`: cut further later; `offcut`: keep it; `waste`: too small to keep. */
  role: z.enum(['part', 'piece', 'offcut', 'waste']),
  /** Part instances inside this piece (the one it becomes when role is `part`). */
  parts: z.array(z.object({ partId: id, instance: z.number().int().min(1) })),
});
export type SawPiece = z.infer<typeof sawPieceSchema>;

export const sawStepSchema = z.object({
  /** 1-based, in the order the cutter makes them. */
  n: z.number().int().min(1),
  /** `rip`: along the stock's length (a line y = const); `crosscut`: across it (x = const). */
  kind: z.enum(['rip', 'crosscut']),
  /** Name of the piece being cut ("A" is the first stock piece, "A1" its first strip, "A1a" …). */
  piece: text().min(1),
  /** Which edge of the piece rides the fence: `low` = its edge nearer the stock's origin (y or x), `high` = the other. */
  reference: z.enum(['low', 'high']),
  /** Fence setting: width of the piece between blade and fence, in mm. */
  fence: mm.min(0),
  /** Length of the cut (the piece's full extent along the cut: always a through-cut). */
  length: positiveMm,
  /** Takes a factory edge off (edge trim). */
  trim: z.boolean().default(false),
  /**
   * A rip whose pieces are both narrower than the safe minimum between blade and fence: not for the rip fence, but
   * for a sled, a track saw or a band saw.
   */
  narrow: z.boolean().optional(),
  /** The name of the saw the cut is made on, when the request names saws. */
  saw: text().max(80).optional(),
  /** The pieces it leaves, low side first; a side the blade eats entirely is absent. */
  produces: z.array(sawPieceSchema).min(1).max(2),
});
export type SawStep = z.infer<typeof sawStepSchema>;

export const pieceFiguresSchema = z.object({
  stockArea: mm.min(0),
  partArea: mm.min(0),
  offcutArea: mm.min(0),
  wasteArea: mm.min(0),
  /** partArea / stockArea. */
  yield: mm.min(0),
  cuts: z.number().int().min(0),
  cutLength: mm.min(0),
  cost: mm.min(0),
});
export type PieceFigures = z.infer<typeof pieceFiguresSchema>;

/** One stock piece used by the plan (a Sheet map or Board map). */
export const planPieceSchema = z.object({
  stockId: id,
  kind: stockKindSchema,
  length: positiveMm,
  width: positiveMm,
  thickness: positiveMm,
  material: text().min(1),
  /** Trim taken from each edge (0 for sawn offcuts). */
  trim: mm.min(0),
  placements: z.array(placementSchema),
  // Optional: an edited plan (layout bench) carries placements only until `rebuildCuts` runs.
  tree: cutNodeSchema.optional(),
  sawOrder: z.array(sawStepSchema).optional(),
  offcuts: z.array(rectSchema).optional(),
  waste: z.array(rectSchema).optional(),
  figures: pieceFiguresSchema.optional(),
});
export type PlanPiece = z.infer<typeof planPieceSchema>;

export const unplacedReasonSchema = z.enum(['too-large', 'grain', 'no-stock-left', 'no-stock']);
export type UnplacedReason = z.infer<typeof unplacedReasonSchema>;

export const unplacedSchema = z.object({
  partId: id,
  instance: z.number().int().min(1),
  label: text().default(''),
  reason: unplacedReasonSchema,
  message: text({ multiline: true }),
});
export type Unplaced = z.infer<typeof unplacedSchema>;

export const planTotalsSchema = z.object({
  byMaterial: z.array(z.object({ material: text(), thickness: mm, kind: stockKindSchema, pieces: z.number().int().min(0) })),
  pieces: z.number().int().min(0),
  stockArea: mm.min(0),
  partArea: mm.min(0),
  offcutArea: mm.min(0),
  wasteArea: mm.min(0),
  yield: mm.min(0),
  cost: mm.min(0),
  cuts: z.number().int().min(0),
  cutLength: mm.min(0),
});
export type PlanTotals = z.infer<typeof planTotalsSchema>;

export const stockLineSchema = z.object({
  stockId: id,
  kind: stockKindSchema,
  material: text(),
  thickness: mm,
  length: mm,
  width: mm,
  count: z.number().int().min(1),
  costEach: mm.min(0),
  cost: mm.min(0),
  source: text().optional(),
});
export type StockLine = z.infer<typeof stockLineSchema>;

export const PLAN_VERSION = 1 as const;

export const planSchema = z.object({
  version: z.literal(PLAN_VERSION),
  pieces: z.array(planPieceSchema),
  unplaced: z.array(unplacedSchema),
  totals: planTotalsSchema.optional(),
  /** From on-hand stock and offcuts. */
  stockToPull: z.array(stockLineSchema).default([]),
  stockToBuy: z.array(stockLineSchema).default([]),
  /** True when the search was stopped early and this is the best plan found by then. */
  cancelled: z.boolean().default(false),
});
export type Plan = z.infer<typeof planSchema>;
export type PlanInput = z.input<typeof planSchema>;
