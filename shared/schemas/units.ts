import { z } from 'zod';
import { lengthFromNumber, parseLength, type LengthUnit } from '@/lib/units/parse-length';

export const lengthUnitSchema = z.enum(['in', 'mm'], { error: 'The unit for bare numbers is "in" or "mm".' });

/** How a shop reads and writes lengths. `feet` shows lengths of a foot or more as 2′ 3-1/2″. */
export const shopUnitsSchema = z.discriminatedUnion(
  'system',
  [
    z.object({
      system: z.literal('imperial'),
      precision: z.union([z.literal(16), z.literal(32)], { error: 'Imperial precision is the fraction denominator: 16 or 32.' }),
      feet: z.boolean().default(false),
    }),
    z.object({
      system: z.literal('metric'),
      precision: z.union([z.literal(0.5), z.literal(1)], { error: 'Metric precision is the step in mm: 0.5 or 1.' }),
      feet: z.boolean().default(false),
    }),
  ],
  { error: 'The unit system is "imperial" or "metric".' },
);
export type ShopUnits = z.infer<typeof shopUnitsSchema>;

/** The unit a shop's bare numbers are read in. */
export const shopLengthUnit = (units: ShopUnits): LengthUnit => (units.system === 'imperial' ? 'in' : 'mm');

/**
 * A length field: takes what a person typed (any form `parseLength` reads) or a number in the shop's
 * unit, and yields mm; a refusal carries the parser's message, so forms show it as is.
 */
export const lengthInput = (unit: LengthUnit) =>
  z.union([z.string(), z.number()], { error: 'Enter a length.' }).transform((value, ctx) => {
    const parsed = typeof value === 'number' ? lengthFromNumber(value, unit) : parseLength(value, { unit });
    if (parsed.ok) return parsed.mm;
    ctx.addIssue({ code: 'custom', message: parsed.error, input: value });
    return z.NEVER;
  });
