import { eq } from 'drizzle-orm';
import { quoteRevisions } from '@/db/schema';
import { hashQuoteToken } from '@/db/queries/quote-answers';
import { jobWithDraftQuote } from '../../support/quote-fixture';
import { nextNumber } from '../../support/unique';
import type { AuthzFixtures, AuthzRow } from './types';

/** A quote sent to its customer with a link of the real shape (distinct per call, no randomness), and its token. */
const sentWithLink =
  (status: 'sent' | 'accepted') =>
  async ({ db, mine }: AuthzFixtures) => {
    const { revision } = await jobWithDraftQuote(db, mine.id);
    const token = `kq${String(nextNumber()).padStart(41, '0')}`;
    await db
      .update(quoteRevisions)
      .set({
        status,
        sentAt: new Date(),
        validUntil: '2099-12-31',
        linkTokenHash: hashQuoteToken(token),
        ...(status === 'accepted' ? { answeredAt: new Date(), acceptedName: 'Matrix Customer' } : {}),
      })
      .where(eq(quoteRevisions.id, revision.id));
    return { token };
  };

const everyone = (status: number) => ({ anonymous: status, owner: status, estimator: status, cutter: status, other: status });

export const rows: AuthzRow[] = [
  // Public: the customer has no account. The link's token is the credential; it opens one quote and nothing else.
  { route: '/api/q/[token]/answer', method: 'POST', target: sentWithLink('sent'), body: { answer: 'decline', reason: '' }, expect: everyone(200) },
  { route: '/api/q/[token]/checkout', method: 'POST', target: sentWithLink('accepted'), expect: everyone(200) },
  // For the payments service only: without its signature every caller gets 400, signed in or not.
  { route: '/api/payments/webhook', method: 'POST', body: {}, expect: everyone(400) },
];
