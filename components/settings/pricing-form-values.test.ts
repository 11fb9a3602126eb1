import { describe, expect, test } from 'vitest';
import { DEFAULT_PRICING } from '@/shared/schemas/pricing';
import { pricingFormText, readPricingForm } from './pricing-form-values';

describe('the pricing form', () => {
  test('shows the defaults and reads them back unchanged (USD and JPY)', () => {
    for (const currency of ['USD', 'JPY']) {
      const text = pricingFormText(DEFAULT_PRICING, currency);
      expect(readPricingForm(text, currency)).toEqual({ ok: true, value: DEFAULT_PRICING });
    }
    expect(pricingFormText(DEFAULT_PRICING, 'USD').rateSaw).toBe('65.00');
    expect(pricingFormText(DEFAULT_PRICING, 'JPY').rateSaw).toBe('6500');
  });

  test('a rate in dollars becomes cents; an empty finishing rate leaves finishing off; a decimal comma reads as the point', () => {
    const text = { ...pricingFormText(DEFAULT_PRICING, 'USD'), rateSaw: '72,50', finishingMinutesPerM2: '9' };
    const read = readPricingForm(text, 'USD');
    expect(read.ok && read.value.hourlyRateMinor.saw).toBe(7250);
    expect(read.ok && read.value.finishingMinutesPerM2).toBe(9);
  });

  test('each bad field gets its own message', () => {
    const text = {
      ...pricingFormText(DEFAULT_PRICING, 'USD'),
      rateSaw: '65.005',
      markupMaterial: '-5',
      taxPercent: '45',
      validityDays: '',
      minutesPerCut: 'two',
    };
    const read = readPricingForm(text, 'USD');
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(read.errors.rateSaw?.[0]).toMatch(/at most 2 decimals/);
    expect(read.errors.markupMaterial?.[0]).toMatch(/type a number/);
    expect(read.errors.validityDays?.[0]).toMatch(/is needed/);
    expect(read.errors.minutesPerCut?.[0]).toMatch(/type a number/);
  });

  test('a tax over 30 % is refused by the schema, on its field', () => {
    const read = readPricingForm({ ...pricingFormText(DEFAULT_PRICING, 'USD'), taxPercent: '45' }, 'USD');
    expect(!read.ok && read.errors.taxPercent?.[0]).toMatch(/over 30 %/);
  });
});
