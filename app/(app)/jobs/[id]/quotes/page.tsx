import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { getDb } from '@/db/client';
import { listJobQuotes } from '@/db/queries/quotes';
import { takeoffPlans } from '@/db/queries/takeoff';
import { NewQuoteForm } from '@/components/quotes/new-quote-form';
import { QuoteStatusBadge } from '@/components/quotes/quote-status';
import { EmptyState } from '@/components/ui/empty-state';
import { can } from '@/lib/auth/permissions';
import { formatMoney } from '@/lib/costing/money';
import { jobSection } from '../job-section';

export const metadata: Metadata = { title: 'Quotes' };

export default async function JobQuotesPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, jobId } = await jobSection(params, 'quotes:read');
  const db = await getDb();
  const scope = scopeOf(db, user);
  const [revisions, plans] = await Promise.all([listJobQuotes(scope, jobId), takeoffPlans(scope, jobId)]);
  return (
    <div>
      <p className="mb-4 max-w-3xl text-sm text-graphite-mute">
        A quote is built from the job: material from a plan’s takeoff with the spoilage allowance, slides from the drawer schedules, labour from the
        plan and the joinery at Shop settings’ rates. Every line can be changed before it is sent; after that, a new revision.
      </p>
      {can(user.role, 'quotes:write') && <NewQuoteForm jobId={jobId} plans={plans} />}
      {revisions.length === 0 ? (
        <EmptyState title="No quote yet.">
          {plans.length ? 'Build one from a plan above.' : 'Nest the job first to quote its material, or build one without a plan.'}
        </EmptyState>
      ) : (
        <div className="card overflow-x-auto">
          <table className="data-table" aria-label="Quotes">
            <thead>
              <tr>
                <th>Quote</th>
                <th>Status</th>
                <th className="num">Total</th>
                <th className="num">Margin</th>
                <th>Sent</th>
              </tr>
            </thead>
            <tbody>
              {revisions.map((r) => (
                <tr key={r.id} className="hover:bg-paper">
                  <td>
                    <Link href={`/jobs/${jobId}/quotes/${r.id}`} className="font-medium underline-offset-2 hover:underline">
                      {r.title}
                    </Link>
                  </td>
                  <td>
                    <QuoteStatusBadge status={r.status} />
                  </td>
                  <td className="num">{formatMoney(r.totals.totalMinor, r.currency)}</td>
                  <td className="num text-graphite-mute">{r.totals.marginPercent !== null ? `${r.totals.marginPercent.toFixed(1)} %` : '—'}</td>
                  <td className="whitespace-nowrap">{r.sentAt?.slice(0, 10) ?? '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
