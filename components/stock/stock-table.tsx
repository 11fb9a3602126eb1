import Link from 'next/link';
import { StatusBadge } from '@/components/ui/status-badge';
import type { StockItemRow } from '@/shared/wire/stock';
import { surfacingSchema } from '@/shared/schemas/stock';
import type { EditableStock } from './edit-stock-dialog';
import { StockRowActions } from './stock-row-actions';

/** Only the details the edit dialog shows reach the browser. */
const editable = (s: StockItemRow): EditableStock => ({
  id: s.id,
  kind: s.kind,
  material: s.material,
  nominalThickness: s.nominalThickness,
  surfacing: surfacingSchema.catch('').parse(s.surfacing),
  grade: s.grade,
  costCents: s.costCents,
  supplier: s.supplier,
  location: s.location,
  lowStockAt: s.lowStockAt,
  buyable: s.buyable,
});

/** Sheets and boards with free, reserved and low-stock figures; prices and value only for those who may see them. */
export function StockTable({
  items,
  len,
  thick,
  money,
  currency,
  canWrite,
}: {
  items: StockItemRow[];
  len: (mm: number) => string;
  thick: (mm: number) => string;
  money: ((cents: number) => string) | null;
  currency: string;
  canWrite: boolean;
}) {
  return (
    <div className="card relative overflow-x-auto">
      <table className="data-table [&_td]:px-2 [&_th]:px-2" aria-label="Sheets and boards">
        <caption className="caption-bottom border-t border-paper-edge px-2 py-2 text-left text-xs text-graphite-mute">
          Tap a material for the history of that size.
        </caption>
        <thead>
          <tr>
            <th>Material</th>
            <th>Thickness</th>
            <th className="num">Length × width</th>
            <th className="num">On hand</th>
            <th className="num">Reserved</th>
            <th className="num">Free</th>
            {money && <th className="num">Cost</th>}
            {money && <th className="num">Value</th>}
            <th>Location</th>
            {canWrite && (
              <th>
                <span className="sr-only">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {items.map((s) => {
            const label = `${s.material} ${s.nominalThickness} ${len(s.length)} × ${len(s.width)}`;
            return (
              <tr key={s.id} data-testid="stock-row" data-material={s.material}>
                <td>
                  <Link
                    href={`/stock?view=history&item=${s.id}`}
                    className="whitespace-nowrap font-medium text-graphite underline decoration-paper-edge hover:decoration-graphite"
                  >
                    {s.material}
                  </Link>
                  <div className="whitespace-nowrap text-xs text-graphite-mute">
                    {[s.kind === 'sheet' ? 'sheet' : `board ${s.surfacing}`.trim(), s.grade, s.buyable ? 'can buy' : ''].filter(Boolean).join(' · ')}
                  </div>
                </td>
                <td>
                  {s.nominalThickness}
                  <span className="ml-1 whitespace-nowrap text-xs text-graphite-mute">({thick(s.thickness)})</span>
                </td>
                <td className="num whitespace-nowrap">
                  {len(s.length)} × {len(s.width)}
                </td>
                <td className="num" data-testid="on-hand">
                  {s.onHand}
                </td>
                <td className="num">{s.reserved}</td>
                <td className="num whitespace-nowrap">
                  {s.free} {s.low && <StatusBadge tone="warn">low</StatusBadge>}
                </td>
                {money && (
                  <td className="num whitespace-nowrap">
                    {money(s.costCents)}
                    {s.kind === 'board' ? ' /bf' : ' ea'}
                  </td>
                )}
                {money && <td className="num">{money(s.valueCents)}</td>}
                <td>{s.location}</td>
                {canWrite && (
                  <td className="text-right">
                    <StockRowActions item={editable(s)} label={label} onHand={s.onHand} currency={currency} />
                  </td>
                )}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
