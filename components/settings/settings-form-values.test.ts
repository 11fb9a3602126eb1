import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import type { ShopSettings } from '@/shared/schemas/shop';
import { LENGTH_FIELDS, readSettingsForm, settingsFormText, UNIT_CHOICES } from './settings-form-values';

const DEMO: ShopSettings = {
  name: 'Larkspur Cabinet Works',
  units: { system: 'imperial', precision: 16, feet: false },
  currency: 'USD',
  kerf: inches(1 / 8),
  edgeTrim: 6,
  minOffcutLength: inches(12),
  minOffcutWidth: inches(4),
  minFenceWidth: inches(1),
  wastePercent: 15,
  timeZone: 'America/Chicago',
  yieldTargetPercent: 75,
  offcutAgeMonths: 6,
};

describe('the Shop settings form', () => {
  test('saving it untouched changes nothing: 6 mm edge trim in an inch shop stays 6 mm, not ¼″', () => {
    const text = settingsFormText(DEMO);
    expect(text.edgeTrim).toBe('6 mm');
    expect(readSettingsForm(DEMO, text)).toEqual({ ok: true, patch: {} });
  });

  test('no stored value drifts through the form, for any units and any lengths (every field)', () => {
    const length = fc.double({ min: 0.01, max: 3000, noNaN: true });
    fc.assert(
      fc.property(
        fc.constantFrom(...UNIT_CHOICES.map((c) => c.units)),
        fc.record(Object.fromEntries(LENGTH_FIELDS.map(([key]) => [key, length])) as Record<(typeof LENGTH_FIELDS)[number][0], typeof length>),
        fc.integer({ min: 0, max: 90 }),
        fc.record({
          yieldTargetPercent: fc.integer({ min: 1, max: 100 }),
          offcutAgeMonths: fc.integer({ min: 1, max: 120 }),
          timeZone: fc.constantFrom('UTC', 'America/Chicago', 'Europe/Berlin', 'Asia/Kolkata'),
        }),
        (units, lengths, wastePercent, others) => {
          const current = { ...DEMO, units, wastePercent, ...others, ...lengths };
          const read = readSettingsForm(current, settingsFormText(current));
          expect(read).toEqual({ ok: true, patch: {} });
        },
      ),
      { seed: 20261202, numRuns: 300 },
    );
  });

  test('even a field retyped to the same text it showed reads back to the exact stored value', () => {
    fc.assert(
      fc.property(fc.constantFrom(...UNIT_CHOICES.map((c) => c.units)), fc.double({ min: 0.01, max: 3000, noNaN: true }), (units, edgeTrim) => {
        const current = { ...DEMO, units, edgeTrim };
        const text = settingsFormText(current);
        // Typed again with a space: not what was shown, so it is read as typed.
        const read = readSettingsForm(current, { ...text, edgeTrim: ` ${text.edgeTrim} x` });
        expect(read.ok).toBe(false);
        const same = readSettingsForm(current, { ...text, edgeTrim: `${text.edgeTrim} ` });
        expect(same).toEqual({ ok: true, patch: {} });
      }),
      { seed: 20261203, numRuns: 100 },
    );
  });

  test('the time zone, yield target and offcut age are sent only when changed, and a non-number is named', () => {
    expect(readSettingsForm(DEMO, { ...settingsFormText(DEMO), timeZone: 'America/Denver', yieldTargetPercent: '80' })).toEqual({
      ok: true,
      patch: { timeZone: 'America/Denver', yieldTargetPercent: 80 },
    });
    expect(readSettingsForm(DEMO, { ...settingsFormText(DEMO), offcutAgeMonths: 'six' })).toEqual({
      ok: false,
      errors: { offcutAgeMonths: ['Enter a whole number of months, such as 6.'] },
    });
  });

  test('sends what a person changed, read in the shop’s unit (3/32″ kerf → 2.38125 mm, NIST 25.4 mm/in)', () => {
    const read = readSettingsForm(DEMO, { ...settingsFormText(DEMO), kerf: '3/32', wastePercent: '10', name: 'Larkspur Works ' });
    expect(read).toEqual({ ok: true, patch: { kerf: 2.38125, wastePercent: 10, name: 'Larkspur Works' } });
  });

  test('names the field a person typed wrong and sends nothing', () => {
    const read = readSettingsForm(DEMO, { ...settingsFormText(DEMO), edgeTrim: 'abc', wastePercent: '' });
    expect(read.ok).toBe(false);
    if (!read.ok) expect(Object.keys(read.errors).sort()).toEqual(['edgeTrim', 'wastePercent']);
  });
});
