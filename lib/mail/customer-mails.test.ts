import { describe, expect, test } from 'vitest';
import { depositReceiptMail, quoteAcceptedMail, quoteMail } from './templates';

const facts = {
  shopName: 'Larkspur Cabinet Works',
  customerName: 'Priya & Sam Hollis',
  title: 'Q-0004 rev B',
  jobName: 'Hollis <kitchen>',
  total: '$609.57',
  deposit: '$304.79',
  noDeposit: false,
  validUntil: '2027-01-02',
  link: 'http://localhost:3000/q/AbC_123',
};

describe('the customer’s mails', () => {
  test('the quote: the link on a line of its own in the text part, the same link as the button, every value escaped in the HTML', () => {
    const m = quoteMail({ ...facts, replaces: 'rev A' });
    expect(m.subject).toBe('Larkspur Cabinet Works: your quote Q-0004 rev B for Hollis <kitchen>');
    expect(m.text.split('\n')).toContain('http://localhost:3000/q/AbC_123');
    expect(m.text).toContain('This quote replaces rev A; its link no longer works.');
    expect(m.text).toContain('A deposit of $304.79 is paid online once you accept. The quote holds until 2027-01-02.');
    expect(m.html).toContain('href="http://localhost:3000/q/AbC_123"');
    expect(m.html).toContain('Hello Priya &amp; Sam Hollis,');
    expect(m.html).toContain('Hollis &lt;kitchen&gt;');
    expect(m.html).not.toMatch(/<img|<script|url\(/i);
  });

  test('no deposit asked: the mails say so instead of a sum', () => {
    expect(quoteMail({ ...facts, noDeposit: true, replaces: null }).text).toContain('No deposit is asked for.');
    expect(quoteAcceptedMail({ ...facts, noDeposit: true, acceptedName: 'Priya Hollis', acceptedAt: 'Dec 3, 2026' }).text).toContain(
      'No deposit is needed',
    );
  });

  test('the receipt: what was paid, the balance, the reference, and no button (nothing more to do)', () => {
    const m = depositReceiptMail({ ...facts, paid: '$304.79', paidAt: 'Dec 3, 2026, 9:45 AM', balance: '$304.78', reference: 'cs_test_1' });
    expect(m.text).toContain('We received your deposit of $304.79 for quote Q-0004 rev B (Hollis <kitchen>) on Dec 3, 2026, 9:45 AM. Thank you.');
    expect(m.text).toContain('Quote total $609.57; balance still to pay $304.78.');
    expect(m.html).not.toContain('<a href');
  });
});
