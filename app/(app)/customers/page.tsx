import type { Metadata } from 'next';
import Link from 'next/link';
import { getDb } from '@/db/client';
import { listCustomers } from '@/db/queries/customers';
import { CustomerFormToggle } from '@/components/customers/customer-form';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';

export const metadata: Metadata = { title: 'Customers' };

export default async function CustomersPage({ searchParams }: { searchParams: Promise<{ q?: string | string[] }> }) {
  const user = await requirePageUser('customers:read');
  const raw = (await searchParams).q;
  const q = (Array.isArray(raw) ? raw[0] : (raw ?? '')).slice(0, 120);
  const customers = await listCustomers({ db: await getDb(), shopId: user.shopId }, q);
  return (
    <>
      <PageHeader title="Customers" lead="The people and firms your jobs are for, with their jobs and quotes." />
      <div className="mb-4 flex flex-wrap items-end gap-3">
        <form role="search" className="flex items-end gap-2" action="/customers">
          <div className="w-72 max-w-[calc(100vw-8rem)]">
            <label htmlFor="customer-search" className="field-label">
              Search
            </label>
            <input
              id="customer-search"
              name="q"
              type="search"
              className="field-input"
              placeholder="Name, company, e-mail or phone"
              defaultValue={q}
            />
          </div>
          <button type="submit" className="btn-quiet">
            Search
          </button>
        </form>
        {can(user.role, 'customers:write') && (
          <div className="ml-auto">
            <CustomerFormToggle label="New customer" />
          </div>
        )}
      </div>
      {customers.length === 0 ? (
        <EmptyState title={q ? `No customer matches “${q}”.` : 'No customers yet.'}>
          {q ? 'Try part of the name, or the e-mail.' : 'Add one here, or type a new name on a job.'}
        </EmptyState>
      ) : (
        <div className="card overflow-x-auto">
          <table className="data-table" aria-label="Customers">
            <thead>
              <tr>
                <th>Name</th>
                <th>Company</th>
                <th>E-mail</th>
                <th>Phone</th>
                <th className="num">Jobs</th>
              </tr>
            </thead>
            <tbody>
              {customers.map((c) => (
                <tr key={c.id} className="hover:bg-paper">
                  <td>
                    <Link href={`/customers/${c.id}`} className="font-medium underline-offset-2 hover:underline">
                      {c.name}
                    </Link>
                  </td>
                  <td>{c.company}</td>
                  <td className="whitespace-nowrap">{c.email}</td>
                  <td className="whitespace-nowrap">{c.phone}</td>
                  <td className="num">{c.jobCount}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="border-t border-paper-edge px-3 py-2 text-xs text-graphite-mute">
            {customers.length} customer{customers.length === 1 ? '' : 's'}
            {q ? ` matching “${q}”` : ''}
          </p>
        </div>
      )}
    </>
  );
}
