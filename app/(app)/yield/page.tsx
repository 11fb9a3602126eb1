import type { Metadata } from 'next';
import { getDb } from '@/db/client';
import { listPlansByStatus } from '@/db/queries/plans';
import { getShopSettings } from '@/db/queries/shops';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/session';
import { formatMoney } from '@/lib/money';

export const metadata: Metadata = { title: 'Yield ledger' };

export default async function YieldPage() {
  const user = await requirePageUser('yield:read');
  const db = await getDb();
  const [settings, done] = await Promise.all([getShopSettings(db, user.shopId), listPlansByStatus(db, user.shopId, ['done'])]);
  return (
    <>
      <PageHeader title="Yield ledger" lead="How much of the stock each finished plan turned into parts, and what the material cost." />
      {done.length === 0 ? (
        <EmptyState title="No finished plans yet.">A plan’s yield and material cost are recorded here when the cutter marks it done.</EmptyState>
      ) : (
        <div className="card overflow-x-auto">
          <table className="data-table" aria-label="Finished plans">
            <thead>
              <tr>
                <th>Job</th>
                <th>Plan</th>
                <th className="num">Yield</th>
                <th className="num">Material cost</th>
                <th>Finished</th>
              </tr>
            </thead>
            <tbody>
              {done.map((p) => (
                <tr key={p.id}>
                  <td className="font-medium">{p.jobName}</td>
                  <td>{p.name}</td>
                  <td className="num">{p.yieldRatio == null ? '—' : `${(p.yieldRatio * 100).toFixed(1)} %`}</td>
                  <td className="num">{p.costCents == null || !settings ? '—' : formatMoney(p.costCents, settings.currency)}</td>
                  <td>{p.updatedAt.toISOString().slice(0, 10)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </>
  );
}
