import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
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
  const [revision, job, hardware] = await Promise.all([getRevision(db, user.shopId, quoteId.data), getJob(db, user.shopId, jobId), listHardware(db, user.shopId)]);
  if (!revision || !job || revision.jobId !== jobId) notFound();
  return (
    <div>
      <Link href={`/jobs/${jobId}/quotes`} className="text-sm text-graphite-mute">← Quotes</Link>
      <h2 className="mb-1 mt-2 flex flex-wrap items-center gap-2">{revision.title} <QuoteStatusBadge status={revision.status} /></h2>
      <p className="mb-4 text-sm text-graphite-mute">
        {revision.sentAt ? `Sent ${revision.sentAt.slice(0, 10)}, valid until ${revision.validUntil}.` : 'A draft: change any line, then mark it sent.'}
        {!revision.latest && ' A newer revision replaces this one.'}
      </p>
      <QuoteEditor key={revision.id} revision={revision} hardware={hardware} customer={{ shopName: shop.name, customer: job.customer, jobName: job.name }} />
    </div>
  );
}
