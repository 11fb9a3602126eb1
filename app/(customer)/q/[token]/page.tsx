import type { Metadata } from 'next';
import { headers } from 'next/headers';
import { getDb } from '@/db/client';
import { customerQuote, QUOTE_TOKEN, reconcileCheckout, type CustomerQuote } from '@/db/queries/quote-answers';
import { HttpError } from '@/lib/api/errors';
import { countingFailedLinks, throttlePublicRequest } from '@/lib/api/throttle';
import { formatMoney } from '@/lib/costing/money';
import { appPayments } from '@/lib/payments/client';
import { CustomerQuoteView } from '@/components/quotes/customer-quote-view';
import { QuoteAnswerForms, PayDepositButton } from '@/components/quotes/quote-answer-forms';

export const metadata: Metadata = { title: 'Your quote', referrer: 'no-referrer', robots: { index: false, follow: false } };

/** The quote as its customer opens it from the shop's e-mail: read it, accept or decline, pay the deposit. */
export default async function CustomerQuotePage({
  params,
  searchParams,
}: {
  params: Promise<{ token: string }>;
  searchParams: Promise<{ checkout?: string }>;
}) {
  const { token } = await params;
  const { checkout } = await searchParams;
  const request = { headers: await headers() };
  let quote: CustomerQuote;
  try {
    await throttlePublicRequest(request, 'quote-page');
    if (!QUOTE_TOKEN.test(token))
      throw new HttpError(404, 'This quote link does not work. Check that the whole address was copied, or ask the shop to send it again.');
    const db = await getDb();
    // Back from the checkout: record the payment now if the payments service says it is paid (its webhook may be late).
    if (checkout && checkout.startsWith('cs_')) await reconcileCheckout(db, (await appPayments()).stripe, token, checkout).catch(() => undefined);
    quote = await countingFailedLinks(request, () => customerQuote(db, token));
  } catch (error) {
    if (!(error instanceof HttpError)) throw error;
    return (
      <div className="card p-6">
        <h1 className="mb-2 text-xl">This quote cannot be shown</h1>
        <p role="alert" className="text-sm text-graphite-soft">
          {error.message}
        </p>
      </div>
    );
  }
  const money = (m: number) => formatMoney(m, quote.revision.currency);
  const deposit = money(quote.totals.depositMinor);
  return (
    <div className="flex flex-col gap-4">
      <header>
        <p className="text-sm uppercase tracking-wide text-graphite-mute">{quote.shopName}</p>
        <h1 className="text-2xl">Quote {quote.title}</h1>
        <p className="text-sm text-graphite-soft">
          {quote.jobName}
          {quote.customerName ? ` · for ${quote.customerName}` : ''}
        </p>
      </header>
      <StateNote quote={quote} token={token} deposit={deposit} checkout={checkout ?? null} />
      <CustomerQuoteView
        shopName={quote.shopName}
        title={quote.title}
        customer={quote.customerName}
        jobName={quote.jobName}
        currency={quote.revision.currency}
        lines={quote.lines}
        totals={quote.totals}
        taxPercent={quote.revision.taxPercent}
        depositPercent={quote.revision.depositPercent}
        validityDays={quote.revision.validityDays}
        validUntil={quote.revision.validUntil}
        terms={quote.revision.terms}
      />
      {quote.state === 'open' && (
        <QuoteAnswerForms token={token} shopName={quote.shopName} deposit={quote.totals.depositMinor > 0 ? deposit : null} />
      )}
    </div>
  );
}

function StateNote({ quote, token, deposit, checkout }: { quote: CustomerQuote; token: string; deposit: string; checkout: string | null }) {
  const box = 'card p-4 text-sm';
  switch (quote.state) {
    case 'open':
      return (
        <p className={box}>Read the quote below, then accept or decline it at the bottom of the page. It holds until {quote.revision.validUntil}.</p>
      );
    case 'accepted':
      return (
        <section className={`${box} flex flex-col gap-3`} aria-label="Deposit">
          <p data-testid="quote-state">
            <strong>Accepted</strong> by {quote.revision.acceptedName} on {quote.answeredAt}. Thank you.
          </p>
          {checkout === 'cancelled' && (
            <p role="status" className="text-graphite-soft">
              The payment was cancelled; nothing was charged.
            </p>
          )}
          {checkout && checkout !== 'cancelled' && (
            <p role="status" className="text-graphite-soft">
              Your payment is being confirmed. Refresh this page in a moment.
            </p>
          )}
          {quote.paymentClosed ? (
            <p>{quote.paymentClosed}</p>
          ) : (
            <>
              <p>
                The next step is the deposit of <strong>{deposit}</strong>, paid online.
              </p>
              <PayDepositButton token={token} deposit={deposit} />
            </>
          )}
        </section>
      );
    case 'paid':
      return (
        <p className={box} data-testid="quote-state">
          <strong>Deposit received</strong> on {quote.depositPaidAt}: {deposit}. Thank you — {quote.shopName} will be in touch about the next steps. A
          receipt is on its way by e-mail.
        </p>
      );
    case 'declined':
      return (
        <p className={box} data-testid="quote-state">
          <strong>Declined</strong> on {quote.answeredAt}. {quote.answerClosed}
        </p>
      );
    default:
      return (
        <p role="alert" className={box} data-testid="quote-state">
          {quote.answerClosed}
        </p>
      );
  }
}
