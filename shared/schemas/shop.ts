import { z } from 'zod';
import { isTimeZone } from '@/lib/dates/shop-time';
import { text } from './text';
import { shopUnitsSchema } from './units';

export { shopUnitsSchema, type ShopUnits } from './units';

const positiveMm = (what: string, max: number) =>
  z
    .number({ error: `${what} must be a number of millimetres.` })
    .min(0, `${what} cannot be negative.`)
    .max(max, `${what} above ${max} mm looks like a typo.`);

export const shopSettingsSchema = z.object({
  name: text().min(1, 'The shop needs a name.').max(120),
  units: shopUnitsSchema,
  currency: z
    .string()
    .trim()
    .regex(/^[A-Z]{3}$/, 'Use a three-letter currency code such as USD or EUR.'),
  kerf: positiveMm('Kerf', 10).refine((v) => v > 0, 'Kerf must be more than zero.'),
  edgeTrim: positiveMm('Edge trim', 50),
  minOffcutLength: positiveMm('Minimum offcut length', 3000),
  minOffcutWidth: positiveMm('Minimum offcut width', 3000),
  minFenceWidth: positiveMm('The narrowest rip at the fence', 300),
  wastePercent: z.number().int('Use a whole percent.').min(0).max(90, 'Waste above 90 % looks like a typo.'),
  timeZone: z.string().trim().refine(isTimeZone, 'Pick the shop’s time zone from the list (a name such as America/Chicago).'),
  yieldTargetPercent: z
    .number()
    .int('Use a whole percent.')
    .min(1, 'The yield target is at least 1 %.')
    .max(100, 'The yield target is at most 100 %.'),
  offcutAgeMonths: z.number().int('Use a whole number of months.').min(1, 'At least 1 month.').max(120, 'More than 10 years looks like a typo.'),
});
export type ShopSettings = z.infer<typeof shopSettingsSchema>;

export const shopSettingsPatchSchema = shopSettingsSchema.partial();
