import { found } from '@/server/page-data';
import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getCustomer } from '@/db/queries/customers';
import { listCustomerQuotes } from '@/db/queries/quotes';
import { QuoteStatusBadge } from '@/components/quotes/quote-status';
import { formatMoney } from '@/lib/costing/money';
import { CustomerFormToggle } from '@/components/customers/customer-form';
import { JobStatusBadge } from '@/components/jobs/job-status';
import { EmptyState } from '@/components/ui/empty-state';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';

export const metadata: Metadata = { title: 'Customer' };

export default async function CustomerPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser('customers:read');
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const db = await getDb();
  const scope = scopeOf(db, user);
  const customer = await found(getCustomer(scope, id.data));
  const quotes = can(user.role, 'quotes:read') ? await listCustomerQuotes(scope, customer.id) : [];
  const { jobs, ...details } = customer;
  const lines: [string, string][] = [
    ['Company', customer.company],
    ['E-mail', customer.email],
    ['Phone', customer.phone],
    ['Billing address', customer.billingAddress],
    ['Site address', customer.siteAddress],
    ['Notes', customer.notes],
  ];
  return (
    <div>
      <Link href="/customers" className="text-sm text-graphite-mute">
        ← Customers
      </Link>
      <header className="mb-4 mt-2 flex flex-wrap items-start justify-between gap-3">
        <h1>{customer.name}</h1>
        {can(user.role, 'customers:write') && <CustomerFormToggle customer={details} label="Edit customer" />}
      </header>
      <dl className="card mb-6 grid gap-x-6 gap-y-3 p-5 sm:grid-cols-2">
        {lines.map(([label, value]) => (
          <div key={label} className={label === 'Notes' ? 'sm:col-span-2' : undefined}>
            <dt className="field-label">{label}</dt>
            <dd className="whitespace-pre-line break-words text-sm">{value || <span className="text-graphite-mute">—</span>}</dd>
          </div>
        ))}
      </dl>
      <h2 className="mb-2">Jobs</h2>
      {jobs.length === 0 ? (
        <EmptyState title="No jobs for this customer yet.">Pick them on a job’s Customer field.</EmptyState>
      ) : (
        <div className="card overflow-x-auto">
          <table className="data-table" aria-label="The customer’s jobs">
            <thead>
              <tr>
                <th>Job</th>
                <th>Status</th>
                <th>Due</th>
              </tr>
            </thead>
            <tbody>
              {jobs.map((j) => (
                <tr key={j.id} className="hover:bg-paper">
                  <td>
                    <Link href={`/jobs/${j.id}`} className="font-medium underline-offset-2 hover:underline">
                      {j.name}
                    </Link>
                  </td>
                  <td>
                    <JobStatusBadge status={j.status} />
                  </td>
                  <td className="whitespace-nowrap">{j.dueDate ?? 'not set'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <h2 className="mb-2 mt-6">Quotes</h2>
      {quotes.length === 0 ? (
        <EmptyState title="No quotes for this customer yet.">Build one on a job’s Quotes section.</EmptyState>
      ) : (
        <div className="card overflow-x-auto">
          <table className="data-table" aria-label="The customer’s quotes">
            <thead>
              <tr>
                <th>Quote</th>
                <th>Job</th>
                <th>Status</th>
                <th className="num">Total</th>
              </tr>
            </thead>
            <tbody>
              {quotes.map((q) => (
                <tr key={q.id} className="hover:bg-paper">
                  <td>
                    <Link href={`/jobs/${q.jobId}/quotes/${q.id}`} className="font-medium underline-offset-2 hover:underline">
                      {q.title}
                    </Link>
                  </td>
                  <td>{q.jobName}</td>
                  <td>
                    <QuoteStatusBadge status={q.status} />
                  </td>
                  <td className="num">{formatMoney(q.totals.totalMinor, q.currency)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
