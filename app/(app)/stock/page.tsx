import type { Metadata } from 'next';
import { getDb } from '@/db/client';
import { getShopSettings } from '@/db/queries/shops';
import { listOffcuts, listStock } from '@/db/queries/stock';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { StatusBadge } from '@/components/ui/status-badge';
import { requirePageUser } from '@/lib/auth/session';
import { can } from '@/lib/auth/permissions';
import { formatLength } from '@/lib/units/format-length';
import { formatMoney } from '@/lib/money';

export const metadata: Metadata = { title: 'Stock room' };

export default async function StockPage() {
  const user = await requirePageUser('stock:read');
  const db = await getDb();
  const [settings, stock, rack] = await Promise.all([getShopSettings(db, user.shopId), listStock(db, user.shopId), listOffcuts(db, user.shopId)]);
  if (!settings) return null;
  const showPrices = can(user.role, 'prices:read');
  const len = (mm: number) => formatLength(mm, settings.units);
  const money = (cents: number) => formatMoney(cents, settings.currency);

  return (
    <>
      <PageHeader title="Stock room" lead="Sheets, boards and offcuts on the rack. Released plans reserve what they use." />
      <section className="mb-8" aria-labelledby="stock-heading">
        <h2 id="stock-heading" className="mb-3">Sheets and boards</h2>
        {stock.length === 0 ? (
          <EmptyState title="The rack is empty.">Receive stock to start.</EmptyState>
        ) : (
          <div className="card overflow-x-auto">
            <table className="data-table" aria-label="Sheets and boards">
              <thead>
                <tr>
                  <th>Material</th>
                  <th>Kind</th>
                  <th>Thickness</th>
                  <th className="num">Length × width</th>
                  <th className="num">On hand</th>
                  <th className="num">Reserved</th>
                  {showPrices && <th className="num">Cost</th>}
                  <th>Location</th>
                </tr>
              </thead>
              <tbody>
                {stock.map((s) => (
                  <tr key={s.id}>
                    <td className="font-medium">{s.material}{s.grade && <span className="ml-1 text-xs text-graphite-mute">{s.grade}</span>}</td>
                    <td>{s.kind === 'sheet' ? 'Sheet' : `Board ${s.surfacing}`.trim()}</td>
                    <td>{s.nominalThickness}</td>
                    <td className="num whitespace-nowrap">{len(s.lengthMm)} × {len(s.widthMm)}</td>
                    <td className="num">
                      {s.onHand} {s.onHand <= s.lowStockAt && <StatusBadge tone="warn">low</StatusBadge>}
                    </td>
                    <td className="num">{s.reserved}</td>
                    {showPrices && <td className="num">{money(s.costCents)}{s.kind === 'board' ? ' /bf' : ' ea'}</td>}
                    <td>{s.location}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
      <section aria-labelledby="offcut-heading">
        <h2 id="offcut-heading" className="mb-3">Offcut rack</h2>
        {rack.length === 0 ? (
          <EmptyState title="No offcuts kept.">Finished plans put their usable offcuts here.</EmptyState>
        ) : (
          <div className="card overflow-x-auto">
            <table className="data-table" aria-label="Offcuts">
              <thead>
                <tr>
                  <th>Material</th>
                  <th className="num">Thickness</th>
                  <th className="num">Length × width</th>
                  <th>Status</th>
                  <th>Location</th>
                </tr>
              </thead>
              <tbody>
                {rack.map((o) => (
                  <tr key={o.id}>
                    <td className="font-medium">{o.material}</td>
                    <td className="num">{len(o.thicknessMm)}</td>
                    <td className="num whitespace-nowrap">{len(o.lengthMm)} × {len(o.widthMm)}</td>
                    <td><StatusBadge tone={o.status === 'available' ? 'good' : 'neutral'}>{o.status}</StatusBadge></td>
                    <td>{o.location}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
    </>
  );
}
