import { z } from 'zod';
import { text } from './text';
import { LINE_KINDS } from '@/lib/costing/quote-totals';
import { minorAmount } from './pricing';

/** A revision's status (db/schema/enums.ts): draft → sent → accepted / declined / expired, or replaced by a newer one sent. */
export const QUOTE_REVISION_STATUSES = ['draft', 'sent', 'replaced', 'accepted', 'declined', 'expired'] as const;
export type QuoteRevisionStatus = (typeof QUOTE_REVISION_STATUSES)[number];

const decimals = (places: number) => (v: number) => Math.abs(Math.round(v * 10 ** places) - v * 10 ** places) < 1e-6;

/** One line of a quote, as stored and as the estimator edits it. */
export const quoteLineSchema = z.object({
  id: z.string().min(1).max(40),
  kind: z.enum(LINE_KINDS, { error: 'A line is material, hardware, labour or other.' }),
  description: text().min(1, 'Describe the line.').max(200, 'Keep the description under 200 characters.'),
  quantity: z
    .number({ error: 'The quantity is a number.' })
    .min(0, 'The quantity cannot be negative.')
    .max(1_000_000, 'That quantity looks like a typo.')
    .refine(decimals(3), 'The quantity takes at most three decimals.'),
  unit: text().max(20, 'Keep the unit under 20 characters.'),
  /** Cost of one unit in minor units (labour: the hourly rate). */
  unitCostMinor: minorAmount('The unit cost'),
  taxable: z.boolean(),
  /** Where the line came from or what to check, for the estimator only (never on the customer's copy). */
  note: text({ multiline: true }).max(300).default(''),
});
export type QuoteLine = z.infer<typeof quoteLineSchema>;

export const quoteDiscountSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('percent'),
    percent: z
      .number()
      .min(0, 'A discount cannot be negative.')
      .max(100, 'A discount is at most 100 %.')
      .refine(decimals(2), 'At most two decimals.'),
  }),
  z.object({ kind: z.literal('amount'), minor: minorAmount('The discount') }),
]);
export type QuoteDiscount = z.infer<typeof quoteDiscountSchema>;

const percent = (what: string, max: number) =>
  z
    .number({ error: `${what} is a percent.` })
    .min(0, `${what} cannot be negative.`)
    .max(max, `${what} over ${max} % looks like a typo.`)
    .refine(decimals(2), `${what} takes at most two decimals.`);

/** What the estimator changes on a draft revision. */
export const quoteRevisionPatchSchema = z.strictObject({
  lines: z.array(quoteLineSchema).max(500, 'A quote of more than 500 lines: split the job.').optional(),
  markupMaterialPercent: percent('The material markup', 1000).optional(),
  markupHardwarePercent: percent('The hardware markup', 1000).optional(),
  discount: quoteDiscountSchema.optional(),
  taxPercent: percent('Sales tax', 30).optional(),
  depositPercent: percent('The deposit', 100).optional(),
  validityDays: z.number().int('Whole days.').min(1, 'At least a day.').max(365, 'Over a year looks like a typo.').optional(),
  terms: text({ multiline: true }).max(4000, 'Keep the terms under 4,000 characters.').optional(),
});
export type QuoteRevisionPatch = z.infer<typeof quoteRevisionPatchSchema>;

/** Making a quote: from one of the job's plans (material and saw time), or from none (hardware and labour only). */
export const newQuoteSchema = z.object({ planId: z.uuid({ error: 'Pick one of the job’s plans.' }).nullable().default(null) });

/** Quote numbers as the shop prints them: Q-0007. */
export const quoteNumberText = (n: number) => `Q-${String(n).padStart(4, '0')}`;
/** Revision letters: 0 → A, 25 → Z, 26 → AA. */
export function revisionLetter(index: number): string {
  if (!Number.isInteger(index) || index < 0) throw new RangeError(`A revision is a whole number from 0; got ${index}.`);
  let n = index;
  let text = '';
  do {
    text = String.fromCharCode(65 + (n % 26)) + text;
    n = Math.floor(n / 26) - 1;
  } while (n >= 0);
  return text;
}
