import { z } from 'zod';
import { DIGEST_TIME } from '@/lib/buying/digest';
import { text } from './text';

const email = z.union([z.literal(''), z.email('Type the supplier’s e-mail address (name@example.com).').max(320)]);

const count = (what: string) =>
  z
    .number({ error: `${what} must be a whole number.` })
    .int(`${what} must be a whole number.`)
    .min(0, `${what} cannot be negative.`)
    .max(100_000, `${what} above 100,000 looks like a typo.`);

/** Make purchase orders: from a plan's stock to buy, from the sizes running low, or an empty one for a supplier. */
export const createPurchaseOrdersSchema = z.discriminatedUnion('from', [
  z.object({ from: z.literal('plan'), planId: z.uuid('Pick a plan.') }),
  z.object({ from: z.literal('low-stock') }),
  z.object({ from: z.literal('manual'), supplier: text({ min: 1, max: 120, minMessage: 'Name the supplier.' }) }),
]);
export type CreatePurchaseOrders = z.infer<typeof createPurchaseOrdersSchema>;

export const purchaseOrderLineInput = z.object({
  stockItemId: z.uuid('Pick a stock size.'),
  quantity: count('The quantity').refine((n) => n > 0, 'Order at least 1 (remove the line to order none).'),
  unitCostCents: count('The unit cost').pipe(z.number().max(100_000_000, 'A unit cost above 1,000,000 looks like a typo.')),
});

/** A draft's changes: supplier, where it is sent, a note for the supplier, and its lines (the whole list). */
export const purchaseOrderPatchSchema = z.object({
  supplier: text({ min: 1, max: 120, minMessage: 'Name the supplier.' }).optional(),
  supplierEmail: email.optional(),
  note: text({ max: 2000, multiline: true }).optional(),
  lines: z
    .array(purchaseOrderLineInput)
    .max(200, 'At most 200 lines on one order.')
    .refine((lines) => new Set(lines.map((l) => l.stockItemId)).size === lines.length, 'A stock size is on the order twice: put it on one line.')
    .optional(),
});
export type PurchaseOrderPatch = z.infer<typeof purchaseOrderPatchSchema>;

export const sendPurchaseOrderSchema = z.object({ supplierEmail: email.optional() });

/**
 * What arrived: pieces per line (0 or missing for a line where nothing came), or `all` for everything still to come;
 * and whether to take the order's prices into the stock room.
 */
export const receivePurchaseOrderSchema = z
  .object({
    lines: z
      .array(z.object({ lineId: z.uuid(), quantity: count('Pieces received') }))
      .max(200)
      .refine((lines) => new Set(lines.map((l) => l.lineId)).size === lines.length, 'A line is named twice.')
      .default([]),
    /** Everything each line still waits for. */
    all: z.boolean().default(false),
    /** Set each received size's cost in the stock room to this order's unit cost (the owner says so per receipt). */
    updateCosts: z.boolean().default(false),
    note: text({ max: 300 }).default(''),
  })
  .refine((r) => r.all || r.lines.some((l) => l.quantity > 0), { message: 'Say how many pieces came on at least one line.', path: ['lines'] });
export type ReceivePurchaseOrder = z.infer<typeof receivePurchaseOrderSchema>;

export const buyingSettingsSchema = z.object({
  purchaseOrderDetails: text({ max: 600, multiline: true }),
  lowStockDigestTime: z.union([z.literal(''), z.string().regex(DIGEST_TIME, 'Use a time such as 07:00 (24-hour clock).')]),
});
export const buyingSettingsPatchSchema = buyingSettingsSchema.partial();
export type BuyingSettings = z.infer<typeof buyingSettingsSchema>;
