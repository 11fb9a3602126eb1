import Link from 'next/link';
import { notFound } from 'next/navigation';
import type { ReactNode } from 'react';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getJob } from '@/db/queries/jobs';
import { JobSectionLinks } from '@/components/jobs/job-section-links';
import { JobStatusBadge } from '@/components/jobs/job-status';
import { requirePageUser } from '@/lib/auth/session';

/** A job's header and its sections: cut list, drawer schedules, plan, takeoff. Each section is its own route. */
export default async function JobLayout({ children, params }: { children: ReactNode; params: Promise<{ id: string }> }) {
  const user = await requirePageUser('jobs:read');
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const job = await getJob(await getDb(), user.shopId, id.data);
  if (!job) notFound();
  return (
    <div>
      <Link href="/jobs" className="text-sm text-graphite-mute print:hidden">← Jobs</Link>
      <header className="mb-4 mt-2">
        <h1 className="flex items-center gap-3">
          {job.name} <JobStatusBadge status={job.status} />
        </h1>
        <p className="mt-1 text-sm text-graphite-mute">
          {job.customer || 'No customer yet'} · due {job.dueDate ?? 'not set'}
        </p>
        {job.notes && <p className="mt-2 max-w-3xl text-sm text-graphite-soft">{job.notes}</p>}
      </header>
      <JobSectionLinks jobId={job.id} />
      {children}
    </div>
  );
}
