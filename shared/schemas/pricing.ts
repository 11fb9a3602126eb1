import { z } from 'zod';
import { text } from './text';

/** How a quote values the offcuts a plan uses: at the area share of their stock's cost, or free (already paid for). */
export const OFFCUT_VALUATIONS = ['area-cost', 'free'] as const;

const minutes = (what: string) =>
  z
    .number({ error: `${what} is a number of minutes.` })
    .min(0, `${what} cannot be negative.`)
    .max(600, `${what} over 600 minutes looks like a typo (hours for minutes?).`)
    .refine((v) => Math.abs(Math.round(v * 100) - v * 100) < 1e-6, `${what} takes at most two decimals.`);
const percent = (what: string, max: number) =>
  z
    .number({ error: `${what} is a percent.` })
    .min(0, `${what} cannot be negative.`)
    .max(max, `${what} over ${max} % looks like a typo.`)
    .refine((v) => Math.abs(Math.round(v * 100) - v * 100) < 1e-6, `${what} takes at most two decimals.`);
/** An hourly rate or a price in the currency's minor units (cents): whole, not negative, under ten million. */
export const minorAmount = (what: string) =>
  z
    .number({ error: `${what} is an amount.` })
    .int(`${what} is counted in whole cents.`)
    .min(0, `${what} cannot be negative.`)
    .max(1_000_000_000, `${what} looks like a slipped digit.`);

/** What a shop charges and how it counts labour: the defaults every new quote starts from (Shop settings → Pricing). */
export const pricingSettingsSchema = z.object({
  hourlyRateMinor: z.object({
    saw: minorAmount('The saw rate'),
    machining: minorAmount('The machining rate'),
    assembly: minorAmount('The assembly rate'),
    finishing: minorAmount('The finishing rate'),
  }),
  minutesPerCut: minutes('Minutes per cut'),
  minutesPerPiece: minutes('Minutes per stock piece'),
  setupMinutesPerCard: minutes('Setup minutes per card'),
  minutesPerJointCorner: minutes('Minutes per joint corner'),
  assemblyMinutesPerBox: minutes('Assembly minutes per drawer box'),
  /** Null: finishing is not quoted (the shop does not finish, or prices it by hand). */
  finishingMinutesPerM2: minutes('Finishing minutes per m²').nullable(),
  markupPercent: z.object({ material: percent('The material markup', 1000), hardware: percent('The hardware markup', 1000) }),
  taxPercent: percent('Sales tax', 30),
  /** Which kinds of line are taxable by default; the estimator may change it per line. */
  taxable: z.object({ material: z.boolean(), hardware: z.boolean(), labour: z.boolean() }),
  depositPercent: percent('The deposit', 100),
  validityDays: z
    .number({ error: 'Validity is a number of days.' })
    .int('Validity is whole days.')
    .min(1, 'A quote is valid at least a day.')
    .max(365, 'Validity over a year looks like a typo.'),
  terms: text({ multiline: true }).max(4000, 'Keep the terms under 4,000 characters.'),
  offcutValuation: z.enum(OFFCUT_VALUATIONS, { error: 'Offcuts are valued at area cost or free.' }),
});
export type PricingSettings = z.infer<typeof pricingSettingsSchema>;

/**
 * A new shop's starting figures (invented; common practice, no source): the owner changes them in Shop settings
 * before the first quote.
 */
export const DEFAULT_PRICING: PricingSettings = {
  hourlyRateMinor: { saw: 6500, machining: 7200, assembly: 5500, finishing: 4800 },
  minutesPerCut: 0.75,
  minutesPerPiece: 2.5,
  setupMinutesPerCard: 20,
  minutesPerJointCorner: 1.5,
  assemblyMinutesPerBox: 12,
  finishingMinutesPerM2: null,
  markupPercent: { material: 30, hardware: 20 },
  taxPercent: 0,
  taxable: { material: true, hardware: true, labour: false },
  depositPercent: 50,
  validityDays: 30,
  terms:
    'Prices are valid for the days shown. A deposit is due on acceptance; work is scheduled once it is received. The balance is due on delivery. Changes after acceptance are quoted separately.',
  offcutValuation: 'area-cost',
};

/** One item of the shop's hardware price list (slides, hinges, pulls, fasteners). */
export const hardwareItemSchema = z.object({
  name: text().min(1, 'Name the item.').max(120, 'Keep the name under 120 characters.'),
  unit: text().min(1, 'Give the unit (each, pair, box of 100…).').max(30, 'Keep the unit under 30 characters.'),
  priceMinor: minorAmount('The price'),
});
export type HardwareItemInput = z.infer<typeof hardwareItemSchema>;
export interface HardwareItem extends HardwareItemInput {
  id: string;
}
