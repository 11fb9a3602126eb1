import { exactLengthText } from '@/lib/cut-list/exact-length';
import { parseLength } from '@/lib/units/parse-length';
import type { ShopSettings } from '@/shared/schemas/shop';
import { shopLengthUnit, type ShopUnits } from '@/shared/schemas/units';

export const UNIT_CHOICES: { key: string; label: string; units: ShopUnits }[] = [
  { key: 'in16', label: 'Inches, to 1/16″', units: { system: 'imperial', precision: 16, feet: false } },
  { key: 'in32', label: 'Inches, to 1/32″', units: { system: 'imperial', precision: 32, feet: false } },
  { key: 'ft16', label: 'Feet and inches, to 1/16″', units: { system: 'imperial', precision: 16, feet: true } },
  { key: 'mm1', label: 'Millimetres, to 1 mm', units: { system: 'metric', precision: 1, feet: false } },
  { key: 'mm05', label: 'Millimetres, to 0.5 mm', units: { system: 'metric', precision: 0.5, feet: false } },
];

export const LENGTH_FIELDS = [
  ['kerf', 'Saw kerf', 'Width of material the blade removes.'],
  ['edgeTrim', 'Edge trim', 'Taken off each factory edge of sheets and boards.'],
  ['minOffcutLength', 'Keep offcuts at least this long', ''],
  ['minOffcutWidth', '… and at least this wide', ''],
  [
    'minFenceWidth',
    'Narrowest rip at the fence',
    'A saw order never leaves a strip narrower than this between blade and fence: it turns the piece, or sends the cut to a sled, track saw or band saw. Your saw’s manual decides.',
  ],
] as const;
type LengthKey = (typeof LENGTH_FIELDS)[number][0];

/** Whole numbers, each with the message for text that is not one. */
export const WHOLE_FIELDS = [
  ['wastePercent', 'Enter the allowance as a whole percent, such as 10.'],
  ['yieldTargetPercent', 'Enter the target as a whole percent, such as 75.'],
  ['offcutAgeMonths', 'Enter a whole number of months, such as 6.'],
] as const;
type WholeKey = (typeof WHOLE_FIELDS)[number][0];

/** The form's fields as text: what a person sees and may change. */
export type SettingsFormText = { name: string; units: string; currency: string; timeZone: string } & Record<LengthKey | WholeKey, string>;

export const unitKey = (u: ShopUnits) =>
  UNIT_CHOICES.find((c) => c.units.system === u.system && c.units.precision === u.precision && c.units.feet === u.feet)?.key ?? 'in16';

/**
 * The stored settings as the form shows them. Lengths are written so they read back exactly (6 mm stays "6 mm" in
 * an inch shop, never "1/4" that would be read back as 6.35 mm).
 */
export function settingsFormText(current: ShopSettings): SettingsFormText {
  const lengths = Object.fromEntries(LENGTH_FIELDS.map(([key]) => [key, exactLengthText(current[key], current.units)])) as Record<LengthKey, string>;
  const wholes = Object.fromEntries(WHOLE_FIELDS.map(([key]) => [key, String(current[key])])) as Record<WholeKey, string>;
  return { name: current.name, units: unitKey(current.units), currency: current.currency, timeZone: current.timeZone, ...wholes, ...lengths };
}

/**
 * What to send: only the fields a person changed, so saving an untouched form changes nothing. Lengths are read in
 * the unit the form showed them in; a field left as shown keeps its stored value to the last digit.
 */
export function readSettingsForm(
  current: ShopSettings,
  text: SettingsFormText,
): { ok: true; patch: Partial<ShopSettings> } | { ok: false; errors: Record<string, string[]> } {
  const shown = settingsFormText(current);
  const errors: Record<string, string[]> = {};
  const patch: Partial<ShopSettings> = {};
  for (const [key] of LENGTH_FIELDS) {
    if (text[key].trim() === shown[key]) continue;
    const parsed = parseLength(text[key], { unit: shopLengthUnit(current.units) });
    if (parsed.ok) patch[key] = parsed.mm;
    else errors[key] = [parsed.error];
  }
  if (text.name.trim() !== current.name) patch.name = text.name.trim();
  if (text.currency.trim().toUpperCase() !== current.currency) patch.currency = text.currency.trim().toUpperCase();
  for (const [key, message] of WHOLE_FIELDS) {
    const typed = text[key].trim();
    if (typed === shown[key]) continue;
    const n = Number(typed);
    if (typed === '' || !Number.isFinite(n)) errors[key] = [message];
    else patch[key] = n;
  }
  if (text.timeZone.trim() !== current.timeZone) patch.timeZone = text.timeZone.trim();
  if (text.units !== shown.units) patch.units = UNIT_CHOICES.find((c) => c.key === text.units)?.units ?? current.units;
  return Object.keys(errors).length ? { ok: false, errors } : { ok: true, patch };
}
