/**
 * What a quote revision's customer page shows and allows, from the revision and the shop's calendar. Pure: the
 * server decides with it, the page shows it, the tests walk it.
 *
 * - sent, on or before its last valid day: open (accept or decline);
 * - sent, after its last valid day: expired (nothing to do but ask the shop for a new quote);
 * - accepted: the deposit can be paid, until it is (then paid);
 * - declined, expired or replaced by a newer revision: says so, cannot be answered or paid.
 */
export type CustomerQuoteState = 'open' | 'accepted' | 'paid' | 'declined' | 'expired' | 'replaced' | 'draft';

export interface AnswerFacts {
  status: 'draft' | 'sent' | 'replaced' | 'accepted' | 'declined' | 'expired';
  /** The last day the quote holds, as YYYY-MM-DD in the shop's time zone (null while a draft). */
  validUntil: string | null;
  /** A deposit payment came in (and was not refunded). */
  depositPaid: boolean;
}

/** `today` is YYYY-MM-DD in the shop's time zone (lib/dates/shop-time.ts shopDay). */
export function customerQuoteState(f: AnswerFacts, today: string): CustomerQuoteState {
  if (f.status === 'sent') return f.validUntil !== null && today > f.validUntil ? 'expired' : 'open';
  if (f.status === 'accepted') return f.depositPaid ? 'paid' : 'accepted';
  return f.status;
}

/** Why the customer cannot accept or decline now, as a sentence for them; null when they can. */
export function refuseAnswer(state: CustomerQuoteState): string | null {
  return {
    open: null,
    accepted: 'You have already accepted this quote.',
    paid: 'You have already accepted this quote and paid the deposit.',
    declined: 'You declined this quote. Ask the shop if you would like a new one.',
    expired: 'This quote has expired. Ask the shop for a new one.',
    replaced: 'This quote was replaced by a newer one: use the link in the shop’s latest e-mail.',
    draft: 'This quote has not been sent yet.',
  }[state];
}

/** Why the deposit cannot be paid now; null when it can. */
export function refusePayment(state: CustomerQuoteState, depositMinor: number): string | null {
  if (state === 'accepted') return depositMinor > 0 ? null : 'This quote asks for no deposit.';
  if (state === 'open') return 'Accept the quote first; then you can pay the deposit.';
  if (state === 'paid') return 'The deposit is already paid. Thank you.';
  return refuseAnswer(state);
}

/** The last day a quote sent on `sentDay` (YYYY-MM-DD, shop's zone) holds: the sending day counts as day 0. */
export function lastValidDay(sentDay: string, validityDays: number): string {
  const [y, m, d] = sentDay.split('-').map(Number);
  return new Date(Date.UTC(y, m - 1, d + validityDays)).toISOString().slice(0, 10);
}
