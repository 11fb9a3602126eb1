import { currencyDigits, toMinorUnits } from '@/lib/costing/money';
import { pricingSettingsSchema, type PricingSettings } from '@/shared/schemas/pricing';

/** The pricing form's fields: [key, label, kind, hint]. Money in the shop's currency, minutes, percents, days. */
export const PRICING_FIELDS = [
  ['rateSaw', 'Saw time, per hour', 'money', ''],
  ['rateMachining', 'Machining, per hour', 'money', ''],
  ['rateAssembly', 'Assembly, per hour', 'money', ''],
  ['rateFinishing', 'Finishing, per hour', 'money', ''],
  ['minutesPerCut', 'Minutes per saw cut', 'number', 'Each rip and crosscut in the plan.'],
  ['minutesPerPiece', 'Minutes per stock piece handled', 'number', 'Bringing a sheet, board or offcut to the saw.'],
  ['setupMinutesPerCard', 'Setup minutes per setup card', 'number', 'Each machine setup the job’s joinery needs.'],
  ['minutesPerJointCorner', 'Minutes per joint corner', 'number', ''],
  ['assemblyMinutesPerBox', 'Assembly minutes per drawer box', 'number', ''],
  ['finishingMinutesPerM2', 'Finishing minutes per m² of faces', 'number', 'Leave empty to keep finishing off quotes.'],
  ['markupMaterial', 'Markup on material (%)', 'number', ''],
  ['markupHardware', 'Markup on hardware (%)', 'number', ''],
  ['taxPercent', 'Sales tax (%)', 'number', 'On the lines marked taxable.'],
  ['depositPercent', 'Deposit on acceptance (%)', 'number', ''],
  ['validityDays', 'Quotes valid for (days)', 'number', ''],
] as const;
type Key = (typeof PRICING_FIELDS)[number][0];
export type PricingFormText = Record<Key, string> & {
  terms: string;
  offcutValuation: string;
  taxMaterial: boolean;
  taxHardware: boolean;
  taxLabour: boolean;
};

const RATE_KEYS = { rateSaw: 'saw', rateMachining: 'machining', rateAssembly: 'assembly', rateFinishing: 'finishing' } as const;

/** An amount in minor units as the form shows it, in major units with the currency's decimals (65.00, ¥4500). */
export const moneyText = (minor: number, currency: string) => (minor / 10 ** currencyDigits(currency)).toFixed(currencyDigits(currency));

export function pricingFormText(p: PricingSettings, currency: string): PricingFormText {
  return {
    rateSaw: moneyText(p.hourlyRateMinor.saw, currency),
    rateMachining: moneyText(p.hourlyRateMinor.machining, currency),
    rateAssembly: moneyText(p.hourlyRateMinor.assembly, currency),
    rateFinishing: moneyText(p.hourlyRateMinor.finishing, currency),
    minutesPerCut: String(p.minutesPerCut),
    minutesPerPiece: String(p.minutesPerPiece),
    setupMinutesPerCard: String(p.setupMinutesPerCard),
    minutesPerJointCorner: String(p.minutesPerJointCorner),
    assemblyMinutesPerBox: String(p.assemblyMinutesPerBox),
    finishingMinutesPerM2: p.finishingMinutesPerM2 === null ? '' : String(p.finishingMinutesPerM2),
    markupMaterial: String(p.markupPercent.material),
    markupHardware: String(p.markupPercent.hardware),
    taxPercent: String(p.taxPercent),
    depositPercent: String(p.depositPercent),
    validityDays: String(p.validityDays),
    terms: p.terms,
    offcutValuation: p.offcutValuation,
    taxMaterial: p.taxable.material,
    taxHardware: p.taxable.hardware,
    taxLabour: p.taxable.labour,
  };
}

/** A typed number: digits with one optional decimal point (a comma is read as the point); '' is null. */
function readNumber(text: string): number | null | 'bad' {
  const t = text.trim().replace(',', '.');
  if (t === '') return null;
  return /^\d+(\.\d+)?$/.test(t) ? Number(t) : 'bad';
}

/** Reads the whole form into pricing settings, or field messages (keys as the form names them). */
export function readPricingForm(
  text: PricingFormText,
  currency: string,
): { ok: true; value: PricingSettings } | { ok: false; errors: Record<string, string[]> } {
  const errors: Record<string, string[]> = {};
  const numbers = {} as Record<Key, number | null>;
  for (const [key, label, kind] of PRICING_FIELDS) {
    const n = readNumber(text[key]);
    if (n === 'bad') errors[key] = [`${label}: type a number such as ${kind === 'money' ? '65.00' : '12'}.`];
    else if (n === null && key !== 'finishingMinutesPerM2') errors[key] = [`${label} is needed.`];
    else numbers[key] = n;
  }
  const rates = {} as PricingSettings['hourlyRateMinor'];
  for (const [key, rate] of Object.entries(RATE_KEYS) as [keyof typeof RATE_KEYS, keyof PricingSettings['hourlyRateMinor']][]) {
    if (errors[key]) continue;
    try {
      rates[rate] = toMinorUnits(numbers[key] ?? 0, currency);
    } catch (e) {
      errors[key] = [(e as Error).message.replace('An amount', 'The rate')];
    }
  }
  if (Object.keys(errors).length) return { ok: false, errors };
  const candidate = {
    hourlyRateMinor: rates,
    minutesPerCut: numbers.minutesPerCut,
    minutesPerPiece: numbers.minutesPerPiece,
    setupMinutesPerCard: numbers.setupMinutesPerCard,
    minutesPerJointCorner: numbers.minutesPerJointCorner,
    assemblyMinutesPerBox: numbers.assemblyMinutesPerBox,
    finishingMinutesPerM2: numbers.finishingMinutesPerM2,
    markupPercent: { material: numbers.markupMaterial, hardware: numbers.markupHardware },
    taxPercent: numbers.taxPercent,
    taxable: { material: text.taxMaterial, hardware: text.taxHardware, labour: text.taxLabour },
    depositPercent: numbers.depositPercent,
    validityDays: numbers.validityDays,
    terms: text.terms.trim(),
    offcutValuation: text.offcutValuation,
  };
  const parsed = pricingSettingsSchema.safeParse(candidate);
  if (parsed.success) return { ok: true, value: parsed.data };
  const back: Record<string, Key | 'terms' | 'offcutValuation'> = {
    'markupPercent.material': 'markupMaterial',
    'markupPercent.hardware': 'markupHardware',
  };
  for (const issue of parsed.error.issues) {
    const path = issue.path.join('.');
    const key = back[path] ?? path;
    (errors[key] ??= []).push(issue.message);
  }
  return { ok: false, errors };
}
