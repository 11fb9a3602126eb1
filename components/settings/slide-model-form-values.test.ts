import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { blankSlideModelText, readSlideModelForm, slideModelText, widthRuleText } from './slide-model-form-values';

const IMPERIAL = { system: 'imperial', precision: 16, feet: false } as const;
const METRIC = { system: 'metric', precision: 1, feet: false } as const;

const text = {
  ...blankSlideModelText(),
  name: 'Halbrook UM-58',
  lengths: '12, 15, 18, 21',
  widthDeduction: '1 5/8',
  maxSideThickness: '5/8',
  bottomRecess: '1/2',
  heightClearance: '3/4',
  rearClearance: '5/8',
};

describe('the slide model form', () => {
  test('reads an inch shop’s model: lengths in inches, shortest first, fractions exact', () => {
    const read = readSlideModelForm({ ...text, lengths: '21, 12; 18, 15' }, IMPERIAL);
    expect(read).toMatchObject({
      ok: true,
      model: {
        lengths: [12, 15, 18, 21].map((l) => expect.closeTo(inches(l), 9)),
        widthDeduction: expect.closeTo(inches(1.625), 9),
        maxSideThickness: expect.closeTo(inches(5 / 8), 9),
      },
    });
  });

  test('reads a metric shop’s lengths with decimal commas, and a blank thickest side as none', () => {
    const read = readSlideModelForm(
      {
        ...text,
        lengths: '250, 300,5; 350',
        widthDeduction: '10',
        maxSideThickness: '',
        bottomRecess: '0',
        heightClearance: '20',
        rearClearance: '0',
      },
      METRIC,
    );
    expect(read).toMatchObject({
      ok: true,
      model: { lengths: [250, 300.5, 350], maxSideThickness: null, bottomRecess: 0, rearClearance: 0 },
    });
  });

  test('names the length it cannot read, and how to separate them', () => {
    const read = readSlideModelForm({ ...text, lengths: '250,300,350' }, METRIC);
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.errors.lengths).toMatch(/^“250,300,350”: .*Separate lengths with a comma and a space, or a semicolon\.$/);
  });

  test('refuses missing fields one by one', () => {
    const read = readSlideModelForm({ ...blankSlideModelText() }, IMPERIAL);
    expect(read.ok).toBe(false);
    if (!read.ok) expect(Object.keys(read.errors).sort()).toEqual(['heightClearance', 'lengths', 'name', 'widthDeduction']);
  });

  test('a saved model reads back to itself through its text: exactly in its own unit, to 0.005 mm in the other', () => {
    const read = readSlideModelForm(text, IMPERIAL);
    if (!read.ok) throw new Error(JSON.stringify(read.errors));
    expect(readSlideModelForm(slideModelText(read.model, IMPERIAL), IMPERIAL)).toEqual(read);
    const metric = readSlideModelForm(slideModelText(read.model, METRIC), METRIC);
    if (!metric.ok) throw new Error(JSON.stringify(metric.errors));
    metric.model.lengths.forEach((l, i) => expect(Math.abs(l - read.model.lengths[i])).toBeLessThanOrEqual(0.005 + 1e-9));
    expect(Math.abs(metric.model.widthDeduction - read.model.widthDeduction)).toBeLessThanOrEqual(0.005 + 1e-9);
  });

  test('says the rule in the shop’s unit', () => {
    expect(widthRuleText({ widthRule: 'inside', widthDeduction: inches(1.625) }, IMPERIAL)).toBe('Inside width = opening − 1-5/8″');
    expect(widthRuleText({ widthRule: 'outside', widthDeduction: 10 }, METRIC)).toBe('Box width = opening − 10 mm');
  });
});
