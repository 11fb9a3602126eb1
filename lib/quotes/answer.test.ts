import { describe, expect, test } from 'vitest';
import { customerQuoteState, lastValidDay, refuseAnswer, refusePayment } from './answer';

describe('the last day a quote holds', () => {
  // Calendar arithmetic checked by hand: December has 31 days, 2028 is a leap year, 2027 is not.
  test.each([
    ['2026-12-03', 30, '2027-01-02'],
    ['2026-12-03', 0, '2026-12-03'],
    ['2028-02-15', 14, '2028-02-29'],
    ['2027-02-15', 14, '2027-03-01'],
    ['2026-12-31', 1, '2027-01-01'],
  ] as const)('sent %s, valid %i days: holds until %s', (sent, days, until) => {
    expect(lastValidDay(sent, days)).toBe(until);
  });
});

describe('what the customer’s page shows and allows', () => {
  const sent = { status: 'sent' as const, validUntil: '2027-01-02', depositPaid: false };
  test('open through its last valid day, expired the day after (days on the shop’s clock)', () => {
    expect(customerQuoteState(sent, '2027-01-02')).toBe('open');
    expect(customerQuoteState(sent, '2027-01-03')).toBe('expired');
  });
  test('accepted until the deposit is paid; an accepted quote never expires', () => {
    expect(customerQuoteState({ ...sent, status: 'accepted' }, '2027-06-01')).toBe('accepted');
    expect(customerQuoteState({ ...sent, status: 'accepted', depositPaid: true }, '2027-06-01')).toBe('paid');
  });
  test('only an open quote can be answered; only an accepted one with a deposit can be paid', () => {
    expect(refuseAnswer('open')).toBeNull();
    for (const s of ['accepted', 'paid', 'declined', 'expired', 'replaced', 'draft'] as const) expect(refuseAnswer(s)).toMatch(/\.$/);
    expect(refusePayment('accepted', 3750)).toBeNull();
    expect(refusePayment('accepted', 0)).toBe('This quote asks for no deposit.');
    expect(refusePayment('open', 3750)).toBe('Accept the quote first; then you can pay the deposit.');
    expect(refusePayment('expired', 3750)).toBe('This quote has expired. Ask the shop for a new one.');
    expect(refusePayment('replaced', 3750)).toMatch(/replaced by a newer one/);
  });
});
