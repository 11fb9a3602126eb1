import { found } from '@/server/page-data';
import { scopeOf } from '@/db/scope';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import type { ReactNode } from 'react';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getJob } from '@/db/queries/jobs';
import { jobEditOptions } from '@/db/queries/job-status';
import { JobActions } from '@/components/jobs/job-actions';
import { JobSectionLinks } from '@/components/jobs/job-section-links';
import { JobStatusBadge } from '@/components/jobs/job-status';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';
import { jobSectionsFor } from '@/lib/nav';

/** A job's header and its sections: cut list, drawer schedules, plan, takeoff. Each section is its own route. */
export default async function JobLayout({ children, params }: { children: ReactNode; params: Promise<{ id: string }> }) {
  const user = await requirePageUser('jobs:read');
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const db = await getDb();
  const scope = scopeOf(db, user);
  const job = await found(getJob(scope, id.data));
  const edit = can(user.role, 'jobs:write') ? await jobEditOptions(scope, job.id, user.role) : null;
  return (
    <div>
      <Link href="/jobs" className="text-sm text-graphite-mute print:hidden">
        ← Jobs
      </Link>
      <header className="mb-4 mt-2 flex flex-wrap items-start justify-between gap-3">
        <div className="min-w-0">
          <h1 className="flex flex-wrap items-center gap-x-3 gap-y-1">
            {job.name}{' '}
            <span data-testid="job-status">
              <JobStatusBadge status={job.status} />
            </span>
          </h1>
          <p className="mt-1 text-sm text-graphite-mute">
            {job.customerId && can(user.role, 'customers:read') ? (
              <Link href={`/customers/${job.customerId}`} className="underline-offset-2 hover:underline">
                {job.customer}
              </Link>
            ) : (
              job.customer || 'No customer yet'
            )}{' '}
            · due {job.dueDate ?? 'not set'}
          </p>
          {job.notes && <p className="mt-2 max-w-3xl whitespace-pre-line text-sm text-graphite-soft">{job.notes}</p>}
        </div>
        {edit && <JobActions job={job} statusChoices={edit.statusChoices} hasHistory={edit.hasHistory} followsPlans={user.role !== 'owner'} />}
      </header>
      <JobSectionLinks jobId={job.id} sections={jobSectionsFor(user.role)} />
      {children}
    </div>
  );
}
