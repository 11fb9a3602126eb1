'use client';

import { formatMoney } from '@/lib/money';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { formatArea } from '@/lib/units/format-area';
import { formatLength } from '@/lib/units/format-length';
import type { Plan } from '@/shared/schemas/nesting';
import type { ShopUnits } from '@/shared/schemas/units';

const KIND = { sheet: 'Sheet', board: 'Board', offcut: 'Offcut' } as const;
const REASON = {
  'too-large': 'Larger than any stock',
  grain: 'Fits only turned; grain forbids',
  'no-stock-left': 'Stock used up',
  'no-stock': 'No stock of this material',
} as const;

type StockLine = Plan['stockToPull'][number];

/** A plan's figures: pieces per material, yield, waste, cost, stock to pull and to buy, and what did not fit. */
export function PlanSummary({ plan, units, currency, showPrices }: { plan: Plan; units: ShopUnits; currency: string; showPrices: boolean }) {
  const t = plan.totals;
  const len = (mm: number) => formatLength(mm, units);
  const thick = (mm: number) => exactLengthText(mm, units);
  const money = (c: number) => formatMoney(Math.round(c), currency);
  const stockTable = (lines: StockLine[], label: string) =>
    lines.length === 0 ? (
      <p className="text-sm text-graphite-mute">None.</p>
    ) : (
      <table className="data-table" aria-label={label}>
        <thead>
          <tr>
            <th>Stock</th>
            <th>Size</th>
            <th className="num">Count</th>
            {showPrices && <th className="num">Cost</th>}
            <th>From</th>
          </tr>
        </thead>
        <tbody>
          {lines.map((l) => (
            <tr key={l.stockId}>
              <td>
                {KIND[l.kind]} · {thick(l.thickness)} {l.material}
              </td>
              <td className="num whitespace-nowrap">
                {len(l.length)} × {len(l.width)}
              </td>
              <td className="num">{l.count}</td>
              {showPrices && <td className="num">{money(l.cost)}</td>}
              <td className="text-graphite-mute">{l.source ?? ''}</td>
            </tr>
          ))}
        </tbody>
      </table>
    );

  return (
    <div className="space-y-4" data-testid="plan-summary">
      {t && (
        <dl className="grid grid-cols-2 gap-3 sm:grid-cols-5">
          <Figure label="Stock pieces" value={String(t.pieces)} />
          <Figure label="Yield" value={`${(t.yield * 100).toFixed(1)} %`} />
          <Figure label="Waste" value={formatArea(t.wasteArea, units)} />
          <Figure label="Offcuts kept" value={formatArea(t.offcutArea, units)} />
          {showPrices ? <Figure label="Material cost" value={money(t.cost)} /> : <Figure label="Cuts" value={String(t.cuts)} />}
        </dl>
      )}
      {plan.cancelled && <p className="text-sm text-amber">Stopped early: this is the best plan found by then.</p>}
      {t && t.byMaterial.length > 0 && (
        <p className="text-sm text-graphite-soft">
          {t.byMaterial.map((m) => `${m.pieces} × ${KIND[m.kind].toLowerCase()} ${thick(m.thickness)} ${m.material}`).join(' · ')}
        </p>
      )}
      {/* Side by side when both have lines; otherwise the one with lines takes the room and the empty one stays small. */}
      <div
        className={`grid gap-4 ${plan.stockToPull.length > 0 && plan.stockToBuy.length > 0 ? 'xl:grid-cols-2' : 'lg:grid-cols-[minmax(0,3fr)_minmax(0,1fr)]'}`}
      >
        <section className={`card overflow-x-auto p-3 ${plan.stockToPull.length === 0 && plan.stockToBuy.length > 0 ? 'lg:order-2' : ''}`}>
          <h3 className="mb-2 text-sm font-semibold">Stock to pull from the rack</h3>
          {stockTable(plan.stockToPull, 'Stock to pull')}
        </section>
        <section className="card overflow-x-auto p-3">
          <h3 className="mb-2 text-sm font-semibold">Stock to buy</h3>
          {stockTable(plan.stockToBuy, 'Stock to buy')}
        </section>
      </div>
      {plan.unplaced.length > 0 && (
        <section className="card overflow-x-auto border-brick/40 p-3">
          <h3 className="mb-2 text-sm font-semibold text-brick">
            {plan.unplaced.length} part{plan.unplaced.length === 1 ? '' : 's'} not placed
          </h3>
          <table className="data-table" aria-label="Parts not placed">
            <thead>
              <tr>
                <th>Part</th>
                <th>Why</th>
                <th>Detail</th>
              </tr>
            </thead>
            <tbody>
              {plan.unplaced.map((u) => (
                <tr key={`${u.partId}#${u.instance}`}>
                  <td>
                    {u.label || u.partId} #{u.instance}
                  </td>
                  <td>{REASON[u.reason]}</td>
                  <td className="text-graphite-mute">{u.message}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      )}
    </div>
  );
}

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div className="card px-3 py-2">
      <dt className="text-xs uppercase tracking-wide text-graphite-mute">{label}</dt>
      <dd className="num text-left text-xl font-semibold">{value}</dd>
    </div>
  );
}
