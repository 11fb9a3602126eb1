import { StatusBadge } from '@/components/ui/status-badge';
import type { TakeoffLine } from '@/lib/stock/takeoff';

/** One takeoff list (to pull, or to buy): size, count, board feet or area, cost, and the allowance for waste. */
export function TakeoffTable({ title, lines, len, area, money, wastePercent }: { title: string; lines: TakeoffLine[]; len: (mm: number) => string; area: (mm2: number) => string; money: (cents: number) => string; wastePercent: number }) {
  return (
    <section className="mb-6" aria-label={title}>
      <h2 className="mb-2">{title}</h2>
      <div className="card overflow-x-auto">
        <table className="data-table" aria-label={title}>
          <thead>
            <tr>
              <th>Stock</th>
              <th className="num">Size</th>
              <th className="num">Pieces</th>
              <th className="num">Board feet / area</th>
              <th className="num">Cost</th>
              <th className="num">With {wastePercent} % waste</th>
              <th>In the stock room now</th>
            </tr>
          </thead>
          <tbody>
            {lines.map((l) => (
              <tr key={l.stockId} data-testid="takeoff-line">
                <td className="font-medium">
                  {l.material} {l.nominalThickness || len(l.thicknessMm)}
                  <span className="ml-1 text-xs text-graphite-mute">{l.kind}</span>
                </td>
                <td className="num whitespace-nowrap">{len(l.lengthMm)} × {len(l.widthMm)}</td>
                <td className="num">{l.count}</td>
                <td className="num whitespace-nowrap">{l.boardFeet !== null ? `${l.boardFeet.toFixed(2)} bf` : area(l.areaMm2)}</td>
                <td className="num">{money(l.costCents)}</td>
                <td className="num whitespace-nowrap">{l.withWaste} · {money(l.costWithWasteCents)}</td>
                <td>
                  {l.coveredWithWaste ? (
                    <StatusBadge tone="good">covered ({l.availableNow} free)</StatusBadge>
                  ) : l.covered ? (
                    <StatusBadge tone="warn">plan covered, not the allowance ({l.availableNow} free)</StatusBadge>
                  ) : (
                    <StatusBadge tone="bad">short: {l.availableNow} free</StatusBadge>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
