import { StatusBadge } from '@/components/ui/status-badge';
import { typesetNominal } from '@/lib/cut-list/stock-match';
import type { MaterialAllowance, TakeoffLine } from '@/lib/stock/takeoff';

interface Formatters {
  len: (mm: number) => string;
  area: (mm2: number) => string;
  money: (cents: number) => string;
}

/** What the stock room has for a size: its free count, as the Stock room shows it, and what this plan already holds. */
function Cover({ covered, free, held, need }: { covered: boolean; free: number; held: number; need: number }) {
  const holds = held > 0 ? `, this plan holds ${held}` : '';
  return covered ? (
    <StatusBadge tone="good">
      covered · {free} free{holds}
    </StatusBadge>
  ) : (
    <StatusBadge tone="bad">
      short · {free} free{holds}, needs {need}
    </StatusBadge>
  );
}

/** One takeoff list (to pull, or to buy): size, count, board feet or area, cost, and whether the rack covers it. */
export function TakeoffTable({ title, lines, len, area, money }: { title: string; lines: TakeoffLine[] } & Formatters) {
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
              <th>In the stock room now</th>
            </tr>
          </thead>
          <tbody>
            {lines.map((l) => (
              <tr key={l.stockId} data-testid="takeoff-line">
                <td className="font-medium">
                  {l.material} {l.nominalThickness ? typesetNominal(l.nominalThickness) : len(l.thickness)}
                  <span className="ml-1 text-xs text-graphite-mute">{l.kind}</span>
                </td>
                <td className="num whitespace-nowrap">
                  {len(l.length)} × {len(l.width)}
                </td>
                <td className="num">{l.count}</td>
                <td className="num whitespace-nowrap">{l.boardFeet !== null ? `${l.boardFeet.toFixed(2)} bf` : area(l.areaMm2)}</td>
                <td className="num">{money(l.costCents)}</td>
                <td>
                  <Cover covered={l.covered} free={l.free} held={l.heldByPlan} need={l.count} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}

/** The spoilage allowance, once per material: how much material, its price, and the whole pieces to have ready. */
export function AllowanceTable({
  allowances,
  lines,
  percent,
  len,
  area,
  money,
}: { allowances: MaterialAllowance[]; lines: TakeoffLine[]; percent: number } & Formatters) {
  const amount = (a: MaterialAllowance, value: number) => (a.measure === 'boardFeet' ? `${value.toFixed(2)} bf` : area(value));
  return (
    <section className="mb-6" aria-label="Spoilage allowance">
      <h2 className="mb-2">Spoilage allowance · {percent} %</h2>
      <div className="card overflow-x-auto">
        <table className="data-table" aria-label="Spoilage allowance">
          <thead>
            <tr>
              <th>Material</th>
              <th className="num">In the plan</th>
              <th className="num">Allowance</th>
              <th className="num">Priced at</th>
              <th className="num">To have ready</th>
              <th>In the stock room now</th>
            </tr>
          </thead>
          <tbody>
            {allowances.map((a) => {
              const main = lines.find((l) => l.stockId === a.stockId);
              const unit = main?.kind === 'board' ? 'boards' : 'sheets';
              return (
                <tr key={`${a.material}|${a.thickness}`} data-testid="allowance-line">
                  <td className="font-medium">
                    {a.material} {main?.nominalThickness ? typesetNominal(main.nominalThickness) : len(a.thickness)}
                  </td>
                  <td className="num whitespace-nowrap">{amount(a, a.amount)}</td>
                  <td className="num whitespace-nowrap">{amount(a, a.allowance)}</td>
                  <td className="num">{money(a.allowanceCents)}</td>
                  <td className="num whitespace-nowrap">{main ? `${a.piecesReady} ${unit} (plan: ${a.pieces})` : 'from offcuts'}</td>
                  <td>{main ? <Cover covered={a.coveredReady} free={main.free} held={main.heldByPlan} need={a.piecesReady} /> : '—'}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </section>
  );
}
