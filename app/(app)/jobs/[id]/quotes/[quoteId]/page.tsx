import { customerOfJob } from '@/db/queries/customers';
import { found } from '@/server/page-data';
import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { formatMoney } from '@/lib/costing/money';
import { formatShopDateTime } from '@/lib/dates/shop-time';
import { getJob } from '@/db/queries/jobs';
import { listHardware } from '@/db/queries/pricing';
import { getRevision } from '@/db/queries/quotes';
import { QuoteEditor } from '@/components/quotes/quote-editor';
import { QuoteStatusBadge } from '@/components/quotes/quote-status';
import { jobSection } from '../../job-section';

export const metadata: Metadata = { title: 'Quote' };

export default async function QuotePage({ params }: { params: Promise<{ id: string; quoteId: string }> }) {
  const { user, jobId, shop } = await jobSection(params, 'quotes:read');
  const quoteId = z.uuid().safeParse((await params).quoteId);
  if (!quoteId.success) notFound();
  const db = await getDb();
  const scope = scopeOf(db, user);
  const [revision, job, hardware] = await found(Promise.all([getRevision(scope, quoteId.data), getJob(scope, jobId), listHardware(scope)]));
  if (revision.jobId !== jobId) notFound();
  const customer = await customerOfJob(scope, job);
  const when = (iso: string | null) => (iso ? formatShopDateTime(new Date(iso), shop.timeZone) : '');
  return (
    <div>
      <Link href={`/jobs/${jobId}/quotes`} className="text-sm text-graphite-mute">
        ← Quotes
      </Link>
      <h2 className="mb-1 mt-2 flex flex-wrap items-center gap-2">
        {revision.title} <QuoteStatusBadge status={revision.status} depositPaid={revision.depositPaidAt !== null} />
      </h2>
      <div className="mb-4 text-sm text-graphite-mute" data-testid="quote-history">
        <p>
          {revision.sentAt
            ? `Sent ${when(revision.sentAt)}; valid until ${revision.validUntil}.`
            : 'A draft: change any line, then send it to the customer.'}
          {!revision.latest && ' A newer revision replaces this one.'}
        </p>
        {revision.status === 'accepted' && (
          <p>
            Accepted online by {revision.acceptedName} on {when(revision.answeredAt)}.
          </p>
        )}
        {revision.status === 'declined' && (
          <p>
            Declined online on {when(revision.answeredAt)}
            {revision.declineReason ? `: “${revision.declineReason}”` : ' (no reason given)'}.
          </p>
        )}
        {revision.status === 'expired' && <p>Expired unanswered after {revision.validUntil}.</p>}
        {revision.depositPaidAt && (
          <p>
            Deposit of {formatMoney(revision.totals.depositMinor, revision.currency)} paid on {when(revision.depositPaidAt)}.
          </p>
        )}
      </div>
      <QuoteEditor
        key={revision.id}
        revision={revision}
        hardware={hardware}
        customer={{ shopName: shop.name, customer: job.customer, jobName: job.name }}
        sendTo={customer && { id: customer.id, name: customer.name, email: customer.email }}
      />
    </div>
  );
}
