import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import { getDb } from '@/db/client';
import { offcutUse, oldOffcuts, reportMaterials, reportSubjects, stockValueReport, yieldOverTime } from '@/db/queries/reports';
import { getShopSettings } from '@/db/queries/shops';
import { OffcutUseChart, QuotingChart, StockValueChart, YieldChart } from '@/components/reports/charts';
import { quotingReport } from '@/db/queries/quoting-report';
import { can } from '@/lib/auth/permissions';
import { winRate } from '@/lib/reports/quoting-report';
import { EmptyState } from '@/components/ui/empty-state';
import { FigureCard as Figure } from '@/components/ui/figure-card';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/server/auth/session';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { rackShare } from '@/lib/reports/offcut-report';
import { overall, percentText, periodLabel, periodTotals, shares } from '@/lib/reports/yield-report';
import { formatMoney } from '@/lib/money';
import { formatArea } from '@/lib/units/format-area';
import { formatLength } from '@/lib/units/format-length';
import { reportQuerySchema, reportRange } from '@/shared/schemas/report';

export const metadata: Metadata = { title: 'Reports' };

type Search = Record<string, string | string[] | undefined>;
const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function ReportsPage({ searchParams }: { searchParams: Promise<Search> }) {
  // The owner sees every report; the estimator the quoting one (their own work); the cutter none.
  const user = await requirePageUser('quotes:read');
  const seesStock = can(user.role, 'yield:read');
  const db = await getDb();
  const scope = scopeOf(db, user);
  const settings = await getShopSettings(scope);
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, first(v)]));
  const parsed = reportQuerySchema.safeParse(raw);
  const query = parsed.success ? parsed.data : reportQuerySchema.parse({});
  const range = reportRange(query, settings.timeZone);
  const problem = !parsed.success ? parsed.error.issues[0].message : 'error' in range ? range.error : null;
  const shown = 'error' in range ? reportRange(reportQuerySchema.parse({}), settings.timeZone) : range;
  if ('error' in shown) return null;
  const filter = {
    shopId: user.shopId,
    timeZone: settings.timeZone,
    material: query.material,
    customerId: query.customer,
    jobId: query.job,
    ...shown,
  };

  const none = Promise.resolve([] as never[]);
  const [subjects, materials, yields, offcuts, old, value, quoting] = await Promise.all([
    reportSubjects(scope),
    seesStock ? reportMaterials(scope) : none,
    seesStock ? yieldOverTime(db, filter) : none,
    seesStock ? offcutUse(db, filter) : none,
    seesStock
      ? oldOffcuts(db, { shopId: user.shopId, timeZone: settings.timeZone, months: settings.offcutAgeMonths, material: query.material })
      : none,
    seesStock
      ? stockValueReport(db, filter)
      : Promise.resolve({ points: [], low: [], unknownPieces: [] } as Awaited<ReturnType<typeof stockValueReport>>),
    quotingReport(db, filter),
  ]);
  const money = (cents: number) => formatMoney(cents, settings.currency);
  const valueMaterials = [...new Set(value.points.flatMap((p) => Object.keys(p.byMaterial)))].sort();
  const area = (mm2: number) => formatArea(mm2, settings.units);
  const areaUnit = settings.units.system === 'metric' ? 'm²' : 'ft²';
  const areaNumber = (mm2: number) => (settings.units.system === 'metric' ? mm2 / 1e6 : mm2 / (304.8 * 304.8));
  const len = (mm: number) => formatLength(mm, settings.units);
  const counted = (n: number, mm2: number) => (n === 0 ? '—' : `${n} · ${area(mm2)}`);
  const totals = periodTotals(yields);
  const all = overall(yields);
  const quotingSum = quoting.periods.reduce(
    (t, p) => ({
      ...t,
      sent: t.sent + p.sent,
      accepted: t.accepted + p.accepted,
      declined: t.declined + p.declined,
      expired: t.expired + p.expired,
      wonMinor: t.wonMinor + p.wonMinor,
      depositsMinor: t.depositsMinor + p.depositsMinor,
    }),
    { period: '', sent: 0, accepted: 0, declined: 0, expired: 0, wonMinor: 0, depositsMinor: 0 },
  );
  const query_ = new URLSearchParams({
    from: shown.from,
    to: shown.to,
    by: shown.by,
    ...(query.material ? { material: query.material } : {}),
    ...(query.customer ? { customer: query.customer } : {}),
    ...(query.job ? { job: query.job } : {}),
  }).toString();
  const narrowed = Boolean(query.customer || query.job);

  return (
    <>
      <PageHeader
        title="Reports"
        lead={`${seesStock ? 'What the stock became, how the rack is used, and how quotes fare' : 'How quotes fare'}, by ${shown.by} on the shop’s clock (${settings.timeZone.replace(/_/g, ' ')}).`}
      />

      <form method="get" className="card mb-6 grid gap-4 p-4 sm:grid-cols-2 lg:grid-cols-4 lg:items-end" aria-label="Report filters">
        <div>
          <label htmlFor="r-from" className="field-label">
            From
          </label>
          <input id="r-from" name="from" type="date" className="field-input" defaultValue={shown.from} />
        </div>
        <div>
          <label htmlFor="r-to" className="field-label">
            To
          </label>
          <input id="r-to" name="to" type="date" className="field-input" defaultValue={shown.to} />
        </div>
        <div>
          <label htmlFor="r-by" className="field-label">
            Group by
          </label>
          <select id="r-by" name="by" className="field-input" defaultValue={shown.by}>
            <option value="month">Month</option>
            <option value="week">Week</option>
          </select>
        </div>
        {seesStock && (
          <div>
            <label htmlFor="r-material" className="field-label">
              Material
            </label>
            <select id="r-material" name="material" className="field-input" defaultValue={query.material ?? ''}>
              <option value="">Every material</option>
              {materials.map((m) => (
                <option key={m} value={m}>
                  {m}
                </option>
              ))}
            </select>
          </div>
        )}
        <div>
          <label htmlFor="r-customer" className="field-label">
            Customer
          </label>
          <select id="r-customer" name="customer" className="field-input" defaultValue={query.customer ?? ''}>
            <option value="">Every customer</option>
            {subjects.customers.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="r-job" className="field-label">
            Job
          </label>
          <select id="r-job" name="job" className="field-input" defaultValue={query.job ?? ''}>
            <option value="">Every job</option>
            {subjects.jobs.map((j) => (
              <option key={j.id} value={j.id}>
                {j.name}
              </option>
            ))}
          </select>
        </div>
        <button type="submit" className="btn-accent">
          Show
        </button>
        {problem && (
          <p role="alert" className="field-error sm:col-span-2 lg:col-span-4">
            {problem} Showing the last twelve months instead.
          </p>
        )}
      </form>

      {seesStock && (
        <>
          <section className="mb-10" aria-labelledby="yield-head">
            <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
              <h2 id="yield-head">Yield over time</h2>
              <a href={`/api/reports/yield?${query_}`} download className="text-sm">
                Download CSV
              </a>
            </div>
            {yields.length === 0 ? (
              <EmptyState title="No finished plans in this range.">A plan counts here when the cutter marks it done.</EmptyState>
            ) : (
              <>
                <div className="mb-4 grid grid-cols-2 gap-3 lg:grid-cols-4">
                  <Figure label="Yield (by stock area)" value={percentText(all.yield)} testId="report-yield" />
                  <Figure label={`Target`} value={`${settings.yieldTargetPercent} %`} />
                  <Figure label="Saw waste" value={percentText(all.sawWaste)} />
                  <Figure label="Spoiled at the saw" value={percentText(all.spoiled)} />
                </div>
                <div className="card mb-4 p-3">
                  <YieldChart
                    target={settings.yieldTargetPercent}
                    points={totals.map((t) => ({
                      label: periodLabel(t.period, shown.by),
                      yield: t.yield === null ? null : t.yield * 100,
                      sawWaste: t.sawWaste === null ? null : t.sawWaste * 100,
                      spoiled: t.spoiled === null ? null : t.spoiled * 100,
                    }))}
                  />
                </div>
                <div className="card overflow-x-auto">
                  <table className="data-table" aria-label="Yield by period and material">
                    <thead>
                      <tr>
                        <th>Period</th>
                        <th>Material</th>
                        <th className="num">Yield</th>
                        <th className="num">Saw waste</th>
                        <th className="num">Spoiled</th>
                        <th className="num">Kept offcuts</th>
                        <th className="num">Stock</th>
                        <th className="num">Plans</th>
                      </tr>
                    </thead>
                    <tbody>
                      {yields.map((r) => {
                        const s = shares(r);
                        const low = s.yield !== null && s.yield * 100 < settings.yieldTargetPercent;
                        return (
                          <tr key={`${r.period}-${r.material}-${r.thickness}`} data-testid="yield-row">
                            <td className="whitespace-nowrap">{periodLabel(r.period, shown.by)}</td>
                            <td className="min-w-36">
                              {exactLengthText(r.thickness, settings.units)} {r.material}
                            </td>
                            <td className={`num whitespace-nowrap ${low ? 'text-brick' : 'text-sage'}`}>{percentText(s.yield)}</td>
                            <td className="num whitespace-nowrap">{percentText(s.sawWaste)}</td>
                            <td className="num whitespace-nowrap">{s.spoiled ? percentText(s.spoiled) : '—'}</td>
                            <td className="num whitespace-nowrap">{percentText(s.kept)}</td>
                            <td className="num whitespace-nowrap">{area(r.stockArea)}</td>
                            <td className="num">{r.plans}</td>
                          </tr>
                        );
                      })}
                    </tbody>
                  </table>
                </div>
                <p className="mt-2 text-xs text-graphite-mute">
                  Shares of the stock area cut. Yield below the target is in red. A period’s figure weighs each material by its stock area.
                </p>
              </>
            )}
          </section>

          <section className="mb-10" aria-labelledby="offcut-head">
            <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
              <h2 id="offcut-head">Offcut use</h2>
              <a href={`/api/reports/offcut-use?${query_}`} download className="text-sm">
                Download CSV
              </a>
            </div>
            {offcuts.length === 0 ? (
              <EmptyState title="Nothing cut or racked in this range." />
            ) : (
              <>
                <div className="card mb-4 p-3">
                  <OffcutUseChart
                    unit={areaUnit}
                    points={offcuts.map((r) => ({
                      label: periodLabel(r.period, shown.by),
                      fromRack: areaNumber(r.fromRackArea),
                      fromNew: areaNumber(r.fromNewStockArea),
                    }))}
                  />
                </div>
                <div className="card overflow-x-auto">
                  <table className="data-table" aria-label="Offcut use by period">
                    <thead>
                      <tr>
                        <th>Period</th>
                        <th className="num">Share from offcuts</th>
                        <th className="num">Cut from offcuts</th>
                        <th className="num">Cut from new stock</th>
                        <th className="num">Offcuts racked</th>
                        <th className="num">Used</th>
                        <th className="num">Scrapped</th>
                      </tr>
                    </thead>
                    <tbody>
                      {offcuts.map((r) => (
                        <tr key={r.period} data-testid="offcut-row">
                          <td className="whitespace-nowrap">{periodLabel(r.period, shown.by)}</td>
                          <td className="num whitespace-nowrap">{percentText(rackShare(r))}</td>
                          <td className="num whitespace-nowrap">{r.fromRackArea > 0 ? area(r.fromRackArea) : '—'}</td>
                          <td className="num whitespace-nowrap">{r.fromNewStockArea > 0 ? area(r.fromNewStockArea) : '—'}</td>
                          <td className="num whitespace-nowrap">{counted(r.racked, r.rackedArea)}</td>
                          <td className="num whitespace-nowrap">{counted(r.used, r.usedArea)}</td>
                          <td className="num whitespace-nowrap">{counted(r.scrapped, r.scrappedArea)}</td>
                        </tr>
                      ))}
                    </tbody>
                  </table>
                </div>
              </>
            )}
            <h3 className="mb-2 mt-6 text-base font-semibold">
              On the rack more than {settings.offcutAgeMonths} month{settings.offcutAgeMonths === 1 ? '' : 's'}
            </h3>
            {old.length === 0 ? (
              <p className="text-sm text-graphite-mute">None: the rack turns over.</p>
            ) : (
              <div className="card overflow-x-auto">
                <table className="data-table" aria-label="Old offcuts">
                  <thead>
                    <tr>
                      <th>Offcut</th>
                      <th className="num">Size</th>
                      <th>Where</th>
                      <th>Racked</th>
                      <th className="num">Age</th>
                    </tr>
                  </thead>
                  <tbody>
                    {old.map((o) => (
                      <tr key={o.id} data-testid="old-offcut">
                        <td className="min-w-36">
                          {exactLengthText(o.thickness, settings.units)} {o.material}
                        </td>
                        <td className="num whitespace-nowrap">
                          {len(o.length)} × {len(o.width)}
                        </td>
                        <td>{o.location || '—'}</td>
                        <td className="whitespace-nowrap">{o.rackedOn}</td>
                        <td className="num whitespace-nowrap">{o.ageDays} days</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            )}
          </section>

          <section className="mb-10" aria-labelledby="value-head">
            <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
              <h2 id="value-head">Stock value</h2>
              <a href={`/api/reports/stock-value?${query_}`} download className="text-sm">
                Download CSV
              </a>
            </div>
            <p className="mb-3 max-w-3xl text-sm text-graphite-mute">
              Rebuilt from the stock history at each period’s close: every sheet, board and offcut counted from its movements, valued at its cost
              today.{narrowed ? ' The stock room is the whole shop’s: this one is not narrowed to a customer or job.' : ''}
            </p>
            <div className="card mb-4 p-3">
              <StockValueChart
                currency={settings.currency}
                points={value.points.map((p) => ({
                  label: periodLabel(p.period, shown.by),
                  onHand: p.onHandCents / 100,
                  reserved: p.reservedCents / 100,
                }))}
              />
            </div>
            <div className="card overflow-x-auto">
              <table className="data-table" aria-label="Stock value by period">
                <thead>
                  <tr>
                    <th>Period</th>
                    <th className="num">On hand</th>
                    <th className="num">Reserved</th>
                    {valueMaterials.map((m) => (
                      <th key={m} className="num">
                        {m}
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {value.points.map((p) => (
                    <tr key={p.period} data-testid="value-row">
                      <td className="whitespace-nowrap">{periodLabel(p.period, shown.by)}</td>
                      <td className="num whitespace-nowrap">{money(p.onHandCents)}</td>
                      <td className="num whitespace-nowrap">{money(p.reservedCents)}</td>
                      {valueMaterials.map((m) => (
                        <td key={m} className="num whitespace-nowrap">
                          {money(p.byMaterial[m] ?? 0)}
                        </td>
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
            {value.unknownPieces.length > 0 && (
              <p role="alert" className="field-error mt-2">
                {value.unknownPieces.length} piece{value.unknownPieces.length === 1 ? '' : 's'} in the stock history no longer in the stock room: not
                valued.
              </p>
            )}
            <h3 className="mb-2 mt-6 text-base font-semibold">Low on the rack now</h3>
            {value.low.length === 0 ? (
              <p className="text-sm text-graphite-mute">Every size is above its low mark.</p>
            ) : (
              <div className="card overflow-x-auto">
                <table className="data-table" aria-label="Low stock">
                  <thead>
                    <tr>
                      <th>Stock</th>
                      <th className="num">Size</th>
                      <th className="num">Free</th>
                      <th className="num">Low mark</th>
                    </tr>
                  </thead>
                  <tbody>
                    {value.low.map((l) => (
                      <tr key={l.id} data-testid="low-stock">
                        <td className="min-w-36 font-medium">
                          {l.material} {l.nominalThickness} <span className="text-xs font-normal text-graphite-mute">{l.kind}</span>
                        </td>
                        <td className="num whitespace-nowrap">
                          {len(l.length)} × {len(l.width)}
                        </td>
                        <td className="num text-brick">{l.free}</td>
                        <td className="num">{l.lowStockAt}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            )}
          </section>
        </>
      )}

      <section className="mb-10" aria-labelledby="quoting-head">
        <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
          <h2 id="quoting-head">Quoting</h2>
          <a href={`/api/reports/quoting?${query_}`} download className="text-sm">
            Download CSV
          </a>
        </div>
        {quoting.periods.length === 0 ? (
          <EmptyState title="No quotes sent or answered in this range.">
            A quote counts here when it is sent, and again when its customer answers it or it runs out.
          </EmptyState>
        ) : (
          <>
            <div className="mb-4 grid grid-cols-2 gap-3 lg:grid-cols-4">
              <Figure label="Sent" value={String(quoting.periods.reduce((n, p) => n + p.sent, 0))} />
              <Figure label="Won (of those answered or run out)" value={percentText(winRate(quotingSum))} testId="report-win-rate" />
              <Figure label="Value won" value={money(quotingSum.wonMinor)} testId="report-value-won" />
              <Figure label="Deposits collected" value={money(quotingSum.depositsMinor)} testId="report-deposits" />
            </div>
            <div className="card mb-4 p-3">
              <QuotingChart
                points={quoting.periods.map((p) => ({
                  label: periodLabel(p.period, shown.by),
                  sent: p.sent,
                  accepted: p.accepted,
                  declined: p.declined,
                  expired: p.expired,
                }))}
              />
            </div>
            <div className="card mb-6 overflow-x-auto">
              <table className="data-table" aria-label="Quotes by period">
                <thead>
                  <tr>
                    <th>Period</th>
                    <th className="num">Sent</th>
                    <th className="num">Accepted</th>
                    <th className="num">Declined</th>
                    <th className="num">Expired</th>
                    <th className="num">Value won</th>
                    <th className="num">Deposits</th>
                  </tr>
                </thead>
                <tbody>
                  {quoting.periods.map((p) => (
                    <tr key={p.period} data-testid="quoting-row">
                      <td className="whitespace-nowrap">{periodLabel(p.period, shown.by)}</td>
                      <td className="num">{p.sent}</td>
                      <td className="num">{p.accepted}</td>
                      <td className="num">{p.declined}</td>
                      <td className="num">{p.expired}</td>
                      <td className="num whitespace-nowrap">{money(p.wonMinor)}</td>
                      <td className="num whitespace-nowrap">{money(p.depositsMinor)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </>
        )}
        <h3 className="mb-2 text-base font-semibold">Material quoted against material used</h3>
        {quoting.jobs.length === 0 ? (
          <p className="text-sm text-graphite-mute">No quote was accepted in this range.</p>
        ) : (
          <div className="card overflow-x-auto">
            <table className="data-table" aria-label="Material quoted against used, per job">
              <thead>
                <tr>
                  <th>Job</th>
                  <th>Quote</th>
                  <th>Accepted</th>
                  <th className="num">Quoted at cost</th>
                  <th className="num">Used (finished plans)</th>
                  <th className="num">Difference</th>
                </tr>
              </thead>
              <tbody>
                {quoting.jobs.map((j) => {
                  const over = j.usedMaterialMinor !== null && j.usedMaterialMinor > j.quotedMaterialMinor;
                  return (
                    <tr key={`${j.jobId}-${j.title}`} data-testid="quoted-vs-used">
                      <td className="min-w-36">
                        <a href={`/jobs/${j.jobId}`}>{j.jobName}</a>
                      </td>
                      <td className="whitespace-nowrap">{j.title}</td>
                      <td className="whitespace-nowrap">{j.acceptedOn}</td>
                      <td className="num whitespace-nowrap">{money(j.quotedMaterialMinor)}</td>
                      <td className="num whitespace-nowrap">{j.usedMaterialMinor === null ? 'Not cut yet' : money(j.usedMaterialMinor)}</td>
                      <td className={`num whitespace-nowrap ${over ? 'text-brick' : ''}`}>
                        {j.usedMaterialMinor === null
                          ? '—'
                          : `${over ? '+' : j.usedMaterialMinor < j.quotedMaterialMinor ? '−' : ''}${money(Math.abs(j.usedMaterialMinor - j.quotedMaterialMinor))}`}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        )}
        <p className="mt-2 text-xs text-graphite-mute">
          Used is the material cost of the job’s finished plans, as the yield ledger keeps it; more than quoted is in red.
        </p>
      </section>
    </>
  );
}
