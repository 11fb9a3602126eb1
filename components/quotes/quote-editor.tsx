'use client';

import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useMemo, useState } from 'react';
import { ApiError, call } from '@/client/api';
import { formatMoney, toMinorUnits } from '@/lib/costing/money';
import { quoteTotals, type QuoteTotals } from '@/lib/costing/quote-totals';
import { moneyText } from '@/components/settings/pricing-form-values';
import type { HardwareItem } from '@/shared/schemas/pricing';
import type { QuoteDiscount, QuoteLine } from '@/shared/schemas/quote';
import type { QuoteRevisionView } from '@/shared/wire/quotes';
import { customerCopy } from '@/lib/quotes/customer-copy';
import { CustomerQuoteView, type CustomerQuoteProps } from './customer-quote-view';

/** What the editor shows and edits of a revision. */
export type EditorRevision = Pick<
  QuoteRevisionView,
  | 'id'
  | 'title'
  | 'status'
  | 'latest'
  | 'currency'
  | 'lines'
  | 'markupMaterialPercent'
  | 'markupHardwarePercent'
  | 'discount'
  | 'taxPercent'
  | 'depositPercent'
  | 'validityDays'
  | 'terms'
  | 'validUntil'
>;

type Row = QuoteLine & { qtyText: string; costText: string };
const KIND_LABEL = { material: 'Material', hardware: 'Hardware', labour: 'Labour', other: 'Other' } as const;
const minorOrNaN = (text: string, currency: string) => {
  try {
    return toMinorUnits(num(text), currency);
  } catch {
    return Number.NaN;
  }
};
const num = (text: string) => (/^\d+(\.\d+)?$/.test(text.trim().replace(',', '.')) ? Number(text.trim().replace(',', '.')) : Number.NaN);

/** The estimator's quote: every line editable, live totals, cost, margin and hours, and the customer's copy beside it. */
export function QuoteEditor({
  revision,
  hardware,
  customer,
  sendTo,
}: {
  revision: EditorRevision;
  hardware: HardwareItem[];
  customer: Omit<
    CustomerQuoteProps,
    'lines' | 'totals' | 'currency' | 'taxPercent' | 'depositPercent' | 'validityDays' | 'terms' | 'validUntil' | 'title'
  >;
  /** The job's customer the quote is e-mailed to (null when the job has none). */
  sendTo: { id: string; name: string; email: string } | null;
}) {
  const router = useRouter();
  const { currency } = revision;
  const editable = revision.status === 'draft';
  const [rows, setRows] = useState<Row[]>(() =>
    revision.lines.map((l) => ({ ...l, qtyText: String(l.quantity), costText: moneyText(l.unitCostMinor, currency) })),
  );
  const [figures, setFigures] = useState({
    markupMaterial: String(revision.markupMaterialPercent),
    markupHardware: String(revision.markupHardwarePercent),
    discount: revision.discount.kind === 'percent' ? String(revision.discount.percent) : moneyText(revision.discount.minor, currency),
    discountKind: revision.discount.kind,
    tax: String(revision.taxPercent),
    deposit: String(revision.depositPercent),
    validity: String(revision.validityDays),
  });
  const [terms, setTerms] = useState(revision.terms);
  const [view, setView] = useState<'estimator' | 'customer'>('estimator');

  // Each row read as it stands; a field that does not read says so on the row and the totals wait for it.
  const read = useMemo(() => {
    const errors: string[] = [];
    const lines: QuoteLine[] = rows.map((r, i) => {
      const quantity = num(r.qtyText);
      let unitCostMinor = Number.NaN;
      try {
        unitCostMinor = toMinorUnits(num(r.costText), currency);
      } catch {
        errors.push(`Line ${i + 1}: the unit cost is not an amount in ${currency}.`);
      }
      if (!Number.isFinite(quantity)) errors.push(`Line ${i + 1}: the quantity is not a number.`);
      const { qtyText: _q, costText: _c, ...line } = r;
      return { ...line, quantity, unitCostMinor };
    });
    const discount: QuoteDiscount =
      figures.discountKind === 'percent'
        ? { kind: 'percent', percent: num(figures.discount) }
        : { kind: 'amount', minor: minorOrNaN(figures.discount, currency) };
    const patch = {
      lines,
      markupMaterialPercent: num(figures.markupMaterial),
      markupHardwarePercent: num(figures.markupHardware),
      discount,
      taxPercent: num(figures.tax),
      depositPercent: num(figures.deposit),
      validityDays: num(figures.validity),
      terms,
    };
    let totals: QuoteTotals | null = null;
    if (!errors.length) {
      try {
        totals = quoteTotals({
          currency,
          lines,
          markupPercent: { material: patch.markupMaterialPercent, hardware: patch.markupHardwarePercent },
          discount,
          taxPercent: patch.taxPercent,
          depositPercent: patch.depositPercent,
        });
      } catch (e) {
        errors.push((e as Error).message);
      }
    }
    return { patch, totals, errors };
  }, [rows, figures, terms, currency]);

  const [serverError, setServerError] = useState<string | null>(null);
  const save = useMutation({
    mutationFn: () => call('PATCH /api/quotes/:id', { params: { id: revision.id }, body: read.patch }),
    onSuccess: () => {
      setServerError(null);
      router.refresh();
    },
    onError: (e) =>
      setServerError(e instanceof ApiError ? [e.message, ...Object.entries(e.fields).map(([k, v]) => `${k}: ${v[0]}`)].join(' ') : String(e)),
  });
  const send = useMutation({
    mutationFn: async () => {
      if (editable) await call('PATCH /api/quotes/:id', { params: { id: revision.id }, body: read.patch });
      return call('POST /api/quotes/:id/send', { params: { id: revision.id } });
    },
    onSuccess: () => router.refresh(),
    onError: (e) => setServerError(e.message),
  });
  const revise = useMutation({
    mutationFn: () => call('POST /api/quotes/:id/revisions', { params: { id: revision.id } }),
    onSuccess: (rev) => router.push(`./${rev.id}`),
    onError: (e) => setServerError(e.message),
  });

  const money = (m: number) => formatMoney(m, currency);
  const update = (i: number, change: Partial<Row>) => setRows((rs) => rs.map((r, j) => (j === i ? { ...r, ...change } : r)));
  const nextId = () => `x-${Date.now().toString(36)}-${rows.length}`;
  const addLine = (value: string) => {
    const item = hardware.find((h) => h.id === value);
    const line: Row = item
      ? {
          id: nextId(),
          kind: 'hardware',
          description: item.name,
          quantity: 1,
          unit: item.unit,
          unitCostMinor: item.priceMinor,
          taxable: true,
          note: 'From the price list.',
          qtyText: '1',
          costText: moneyText(item.priceMinor, currency),
        }
      : {
          id: nextId(),
          kind: value as Row['kind'],
          description: value === 'other' ? 'Delivery' : KIND_LABEL[value as Row['kind']],
          quantity: 1,
          unit: value === 'labour' ? 'h' : 'each',
          unitCostMinor: 0,
          taxable: value !== 'labour',
          note: '',
          qtyText: '1',
          costText: moneyText(0, currency),
        };
    setRows((rs) => [...rs, line]);
  };
  const hours = rows.filter((r) => r.kind === 'labour').reduce((n, r) => n + (Number.isFinite(num(r.qtyText)) ? num(r.qtyText) : 0), 0);
  const t = read.totals;

  return (
    <div>
      <div className="mb-4 flex flex-wrap items-center gap-2" role="group" aria-label="Who the quote is shown as">
        <button
          type="button"
          className={view === 'estimator' ? 'btn-accent' : 'btn-quiet'}
          aria-pressed={view === 'estimator'}
          onClick={() => setView('estimator')}
        >
          Estimator’s view
        </button>
        <button
          type="button"
          className={view === 'customer' ? 'btn-accent' : 'btn-quiet'}
          aria-pressed={view === 'customer'}
          onClick={() => setView('customer')}
        >
          Customer’s copy
        </button>
        <a className="btn-quiet ml-auto" href={`/api/quotes/${revision.id}/pdf`} download>
          Download PDF
        </a>
      </div>

      {view === 'customer' && t && (
        <CustomerQuoteView
          {...customer}
          title={revision.title}
          currency={currency}
          {...customerCopy(read.patch.lines, t)}
          taxPercent={read.patch.taxPercent}
          depositPercent={read.patch.depositPercent}
          validityDays={read.patch.validityDays}
          validUntil={revision.validUntil}
          terms={terms}
        />
      )}

      {view === 'estimator' && (
        <>
          {/* relative: the header's sr-only label stays inside the scroller (it pushed the page sideways at 820 px). */}
          <div className="card relative mb-4 overflow-x-auto">
            <table className="data-table min-w-[56rem]" aria-label="Quote lines">
              <thead>
                <tr>
                  <th>Kind</th>
                  <th>Description</th>
                  <th className="num">Qty</th>
                  <th>Unit</th>
                  <th className="num">Unit cost</th>
                  <th className="num">Cost</th>
                  <th className="num">Price</th>
                  <th>Tax</th>
                  <th>
                    <span className="sr-only">Remove</span>
                  </th>
                </tr>
              </thead>
              <tbody>
                {rows.map((r, i) => (
                  <tr key={r.id} data-testid="quote-line">
                    <td className="text-xs text-graphite-mute">{KIND_LABEL[r.kind]}</td>
                    <td className="min-w-[18rem]">
                      <textarea
                        aria-label={`Line ${i + 1} description`}
                        rows={2}
                        className="field-input resize-y"
                        value={r.description}
                        disabled={!editable}
                        onChange={(e) => update(i, { description: e.target.value })}
                      />
                      {r.note && <p className="mt-1 text-xs text-graphite-mute">{r.note}</p>}
                    </td>
                    <td className="num">
                      <input
                        aria-label={`Line ${i + 1} quantity`}
                        inputMode="decimal"
                        className="field-input w-20 text-right font-mono"
                        value={r.qtyText}
                        disabled={!editable}
                        onChange={(e) => update(i, { qtyText: e.target.value })}
                      />
                    </td>
                    <td>
                      <input
                        aria-label={`Line ${i + 1} unit`}
                        className="field-input w-20"
                        value={r.unit}
                        disabled={!editable}
                        onChange={(e) => update(i, { unit: e.target.value })}
                      />
                    </td>
                    <td className="num">
                      <input
                        aria-label={`Line ${i + 1} unit cost`}
                        inputMode="decimal"
                        className="field-input w-28 text-right font-mono"
                        value={r.costText}
                        disabled={!editable}
                        onChange={(e) => update(i, { costText: e.target.value })}
                      />
                    </td>
                    <td className="num">{t ? money(t.lines[i].costMinor) : '—'}</td>
                    <td className="num font-medium">{t ? money(t.lines[i].priceMinor) : '—'}</td>
                    <td>
                      <input
                        type="checkbox"
                        aria-label={`Line ${i + 1} taxable`}
                        checked={r.taxable}
                        disabled={!editable}
                        onChange={(e) => update(i, { taxable: e.target.checked })}
                      />
                    </td>
                    <td>
                      {editable && (
                        <button
                          type="button"
                          className="btn-quiet"
                          aria-label={`Remove line ${i + 1}`}
                          onClick={() => setRows((rs) => rs.filter((_, j) => j !== i))}
                        >
                          Remove
                        </button>
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
            {editable && (
              <div className="flex flex-wrap items-center gap-2 border-t border-paper-edge px-3 py-2">
                <label htmlFor="add-line" className="text-sm text-graphite-mute">
                  Add a line
                </label>
                <select
                  id="add-line"
                  className="field-input w-auto"
                  value=""
                  onChange={(e) => {
                    if (e.target.value) addLine(e.target.value);
                  }}
                >
                  <option value="">Choose…</option>
                  <optgroup label="Hardware price list">
                    {hardware.map((h) => (
                      <option key={h.id} value={h.id}>
                        {h.name} ({money(h.priceMinor)} / {h.unit})
                      </option>
                    ))}
                  </optgroup>
                  <optgroup label="A line of your own">
                    <option value="material">Material</option>
                    <option value="hardware">Hardware</option>
                    <option value="labour">Labour</option>
                    <option value="other">Other</option>
                  </optgroup>
                </select>
              </div>
            )}
          </div>

          <div className="grid gap-4 lg:grid-cols-[1fr_22rem]">
            <fieldset className="card grid gap-3 p-4 sm:grid-cols-3" disabled={!editable}>
              <legend className="sr-only">Markups, discount, tax, deposit</legend>
              {(
                [
                  ['markupMaterial', 'Markup on material (%)'],
                  ['markupHardware', 'Markup on hardware (%)'],
                  ['tax', 'Sales tax (%)'],
                  ['deposit', 'Deposit (%)'],
                  ['validity', 'Valid for (days)'],
                ] as const
              ).map(([k, label]) => (
                <div key={k}>
                  <label htmlFor={`q-${k}`} className="field-label">
                    {label}
                  </label>
                  <input
                    id={`q-${k}`}
                    inputMode="decimal"
                    className="field-input font-mono"
                    value={figures[k]}
                    onChange={(e) => setFigures((f) => ({ ...f, [k]: e.target.value }))}
                  />
                </div>
              ))}
              <div>
                <label htmlFor="q-discount" className="field-label">
                  Discount
                </label>
                <div className="flex gap-1">
                  <input
                    id="q-discount"
                    inputMode="decimal"
                    className="field-input font-mono"
                    value={figures.discount}
                    onChange={(e) => setFigures((f) => ({ ...f, discount: e.target.value }))}
                  />
                  <select
                    aria-label="Discount as"
                    className="field-input w-auto"
                    value={figures.discountKind}
                    onChange={(e) => setFigures((f) => ({ ...f, discountKind: e.target.value as 'percent' | 'amount' }))}
                  >
                    <option value="percent">%</option>
                    <option value="amount">{currency}</option>
                  </select>
                </div>
              </div>
              <div className="sm:col-span-3">
                <label htmlFor="q-terms" className="field-label">
                  Terms
                </label>
                <textarea id="q-terms" rows={3} className="field-input" value={terms} onChange={(e) => setTerms(e.target.value)} />
              </div>
            </fieldset>

            <section className="card p-4" aria-label="Totals">
              {t ? (
                <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm">
                  <dt>Subtotal</dt>
                  <dd className="num">{money(t.subtotalMinor)}</dd>
                  <dt>Discount</dt>
                  <dd className="num">{t.discountMinor > 0 ? `−${money(t.discountMinor)}` : '—'}</dd>
                  <dt>Tax on {money(t.taxableMinor)}</dt>
                  <dd className="num">{money(t.taxMinor)}</dd>
                  <dt className="font-semibold">Total</dt>
                  <dd className="num font-semibold" data-testid="editor-total">
                    {money(t.totalMinor)}
                  </dd>
                  <dt>Deposit</dt>
                  <dd className="num">{money(t.depositMinor)}</dd>
                  <dt>Balance</dt>
                  <dd className="num">{money(t.balanceMinor)}</dd>
                  <dt className="mt-3 border-t border-paper-edge pt-2 text-graphite-mute">Cost (labour at its rate)</dt>
                  <dd className="num mt-3 border-t border-paper-edge pt-2 text-graphite-mute">{money(t.costMinor)}</dd>
                  <dt className="text-graphite-mute">Margin</dt>
                  <dd className="num text-graphite-mute" data-testid="editor-margin">
                    {money(t.marginMinor)}
                    {t.marginPercent !== null ? ` · ${t.marginPercent.toFixed(1)} %` : ''}
                  </dd>
                  <dt className="text-graphite-mute">Labour hours</dt>
                  <dd className="num text-graphite-mute">{hours.toFixed(2)} h</dd>
                </dl>
              ) : (
                <p role="alert" className="field-error">
                  {read.errors[0]}
                </p>
              )}
              <p className="mt-3 text-xs text-graphite-mute">Cost, margin and hours are yours: the customer’s copy and the PDF never show them.</p>
            </section>
          </div>
        </>
      )}

      {serverError && (
        <p role="alert" className="field-error mt-3">
          {serverError}
        </p>
      )}
      <div className="mt-4 flex flex-wrap items-center gap-2">
        {editable && (
          <button type="button" className="btn-quiet" disabled={!t || save.isPending} onClick={() => save.mutate()}>
            {save.isPending ? 'Saving…' : 'Save draft'}
          </button>
        )}
        {editable && revision.latest && sendTo?.email && (
          <button
            type="button"
            className="btn-accent"
            disabled={!t || send.isPending || rows.length === 0}
            onClick={() => {
              if (
                window.confirm(
                  `E-mail ${revision.title} to ${sendTo.name} <${sendTo.email}>, with the PDF and a link to accept it and pay the deposit online? The revision can no longer be changed once sent; a new revision can.`,
                )
              )
                send.mutate();
            }}
          >
            {send.isPending ? 'Sending…' : `Send to ${sendTo.name}`}
          </button>
        )}
        {editable && revision.latest && !sendTo?.email && (
          <p className="text-sm text-graphite-mute">
            {sendTo ? (
              <>
                To send it, add an e-mail address for <a href={`/customers/${sendTo.id}`}>{sendTo.name}</a>.
              </>
            ) : (
              'To send it, give the job a customer with an e-mail address.'
            )}
          </p>
        )}
        {!editable && revision.latest && revision.status !== 'accepted' && (
          <button type="button" className="btn-accent" disabled={revise.isPending} onClick={() => revise.mutate()}>
            New revision
          </button>
        )}
        {save.isSuccess && (
          <span role="status" className="text-sm text-sage">
            Saved.
          </span>
        )}
      </div>
    </div>
  );
}
