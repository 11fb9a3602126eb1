import Link from 'next/link';
import { FigureCard as Figure } from '@/components/ui/figure-card';
import type { listYieldLedger } from '@/db/queries/stock-yield';

type Ledger = Awaited<ReturnType<typeof listYieldLedger>>;
const pct = (r: number | null) => (r == null ? '—' : `${(r * 100).toFixed(1)} %`);

/**
 * Yield, waste and material cost of every finished plan, with the shop's figures weighted by stock area. Waste is
 * shown in two: the saw's (trim, kerf, pieces too small to keep) and parts spoiled at the saw, which were re-cut.
 */
export function YieldLedger({
  ledger,
  money,
  area,
  day,
}: {
  ledger: Ledger;
  money: (cents: number) => string;
  area: (mm2: number) => string;
  day: (at: Date) => string;
}) {
  const { totals } = ledger;
  return (
    <>
      <div className="mb-5 grid grid-cols-2 gap-3 sm:grid-cols-3 xl:grid-cols-5">
        <Figure label="Yield (by stock area)" value={pct(totals.yieldRatio)} />
        <Figure label="Saw waste" value={pct(totals.sawWasteRatio)} />
        <Figure label="Spoiled at the saw" value={pct(totals.spoiledRatio)} />
        <Figure label="Material cost" value={money(totals.costCents)} />
        <Figure label="Stock cut" value={area(totals.stockArea)} />
      </div>
      <div className="card overflow-x-auto">
        <table className="data-table" aria-label="Finished plans">
          <thead>
            <tr>
              <th>Job</th>
              <th>Plan</th>
              <th className="num">Yield</th>
              <th className="num">Saw waste</th>
              <th className="num">Spoiled</th>
              <th className="num">Offcuts racked</th>
              <th className="num">Material cost</th>
              <th>Finished</th>
            </tr>
          </thead>
          <tbody>
            {ledger.plans.map((p) => (
              <tr key={p.id} data-testid="ledger-row">
                <td className="font-medium">
                  <Link href={`/jobs/${p.jobId}`}>{p.jobName}</Link>
                </td>
                <td>
                  {p.name}
                  {p.recutPlan && <span className="ml-1 whitespace-nowrap text-xs text-graphite-mute">(re-cuts)</span>}
                </td>
                <td className="num whitespace-nowrap">{pct(p.yieldRatio)}</td>
                <td className="num whitespace-nowrap">{pct(p.sawWasteRatio)}</td>
                <td className={`num whitespace-nowrap ${p.spoiledRatio > 0 ? 'text-brick' : ''}`} data-testid="ledger-spoiled">
                  {p.spoiledRatio > 0 ? pct(p.spoiledRatio) : '—'}
                </td>
                <td className="num">{p.offcutsRacked}</td>
                <td className="num">{p.costCents == null ? '—' : money(p.costCents)}</td>
                <td className="whitespace-nowrap">
                  {day(p.finishedAt ?? p.updatedAt)}
                  {p.finishedBy && <span className="text-graphite-mute"> · {p.finishedBy}</span>}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
