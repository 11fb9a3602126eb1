import { describe, expect, test } from 'vitest';
import { formatMoney } from '@/lib/money';
import { describeDetailChanges } from './describe-detail-changes';

const usd = (cents: number) => formatMoney(cents, 'USD');

describe('describeDetailChanges', () => {
  test('names each changed field from → to, in reading order, with cost in the shop’s currency', () => {
    const text = describeDetailChanges({ costCents: { from: 9400, to: 9950 }, location: { from: 'Rack B1', to: 'Rack B2' } }, usd);
    expect(text).toBe('Cost $94.00 → $99.50; Location Rack B1 → Rack B2');
  });

  test('keeps cost figures from people who may not see prices, but still says the cost changed', () => {
    const text = describeDetailChanges({ costCents: { from: 9400, to: 9950 }, supplier: { from: '', to: 'Cedar Run' } }, null);
    expect(text).toBe('Cost changed; Supplier — → Cedar Run');
    expect(text).not.toMatch(/\d/);
  });

  test('reads yes/no for buying more, and a change recorded without its old value as the new value alone', () => {
    expect(describeDetailChanges({ buyable: { from: true, to: false } }, usd)).toBe('Can buy more yes → no');
    expect(describeDetailChanges({ lowStockAt: { from: undefined, to: 4 } }, usd)).toBe('Low-stock mark 4');
  });
});
