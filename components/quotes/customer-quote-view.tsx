import { formatMoney } from '@/lib/costing/money';
import type { CustomerLine, CustomerTotals } from '@/lib/quotes/customer-copy';

export interface CustomerQuoteProps {
  shopName: string;
  title: string;
  customer: string;
  jobName: string;
  currency: string;
  /** The customer's copy (lib/quotes/customer-copy.ts): prices only. */
  lines: CustomerLine[];
  totals: CustomerTotals;
  taxPercent: number;
  depositPercent: number;
  validityDays: number;
  validUntil: string | null;
  terms: string;
}

/** The quote as the customer reads it: prices only, never cost, markup, margin or hours. */
export function CustomerQuoteView(q: CustomerQuoteProps) {
  const money = (m: number) => formatMoney(m, q.currency);
  const t = q.totals;
  return (
    <article className="card p-5" aria-label="The customer’s copy">
      <header className="mb-4 flex flex-wrap justify-between gap-2">
        <div>
          <p className="text-xs uppercase tracking-wide text-graphite-mute">{q.shopName}</p>
          <h3 className="text-lg font-semibold">{q.title}</h3>
          <p className="text-sm text-graphite-soft">
            {q.jobName}
            {q.customer ? ` · for ${q.customer}` : ''}
          </p>
        </div>
        <p className="text-sm text-graphite-mute">{q.validUntil ? `Valid until ${q.validUntil}` : `Valid ${q.validityDays} days from sending`}</p>
      </header>
      {/* A phone shows each line as a short block (the amount always in view); wider screens a table. */}
      <ul className="divide-y divide-paper-edge border-y border-paper-edge sm:hidden" aria-label="Quote lines">
        {q.lines.map((l) => (
          <li key={l.id} className="flex items-start justify-between gap-3 py-2 text-sm">
            <div className="min-w-0">
              <p>{l.description}</p>
              {l.quantity !== null && l.unitPriceMinor !== null && (
                <p className="text-xs text-graphite-mute">
                  {l.quantity} {l.unit} × {money(l.unitPriceMinor)}
                </p>
              )}
            </div>
            <span className="num shrink-0">{money(l.priceMinor)}</span>
          </li>
        ))}
      </ul>
      <div className="hidden overflow-x-auto sm:block">
        <table className="data-table" aria-label="Quote lines">
          <thead>
            <tr>
              <th>Item</th>
              <th className="num">Qty</th>
              <th>Unit</th>
              <th className="num">Unit price</th>
              <th className="num">Amount</th>
            </tr>
          </thead>
          <tbody>
            {q.lines.map((l) => (
              <tr key={l.id}>
                <td>{l.description}</td>
                {/* Labour is shown as a sum: hours and rates are the shop's own business. */}
                <td className="num">{l.quantity ?? ''}</td>
                <td>{l.unit}</td>
                <td className="num">{l.unitPriceMinor === null ? '' : money(l.unitPriceMinor)}</td>
                <td className="num">{money(l.priceMinor)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <dl className="ml-auto mt-4 grid max-w-sm grid-cols-[1fr_auto] gap-x-6 gap-y-1 text-sm">
        <dt>Subtotal</dt>
        <dd className="num">{money(t.subtotalMinor)}</dd>
        {t.discountMinor > 0 && (
          <>
            <dt>Discount</dt>
            <dd className="num">−{money(t.discountMinor)}</dd>
          </>
        )}
        {q.taxPercent > 0 && (
          <>
            <dt>Sales tax ({q.taxPercent} %)</dt>
            <dd className="num">{money(t.taxMinor)}</dd>
          </>
        )}
        <dt className="font-semibold">Total</dt>
        <dd className="num font-semibold" data-testid="quote-total">
          {money(t.totalMinor)}
        </dd>
        <dt>Deposit on acceptance ({q.depositPercent} %)</dt>
        <dd className="num" data-testid="quote-deposit">
          {money(t.depositMinor)}
        </dd>
        <dt>Balance</dt>
        <dd className="num">{money(t.balanceMinor)}</dd>
      </dl>
      {q.terms && <p className="mt-4 whitespace-pre-line text-xs text-graphite-soft">{q.terms}</p>}
    </article>
  );
}
