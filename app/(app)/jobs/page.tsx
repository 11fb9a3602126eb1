import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { Suspense } from 'react';
import { JobsBoard } from '@/components/jobs/jobs-board';
import { PageHeader } from '@/components/ui/page-header';
import { currentShopSettings, requirePageUser } from '@/server/auth/session';
import { can } from '@/lib/auth/permissions';
import { getDb } from '@/db/client';
import { listJobsPage } from '@/db/queries/jobs';
import { jobListQuerySchema } from '@/shared/schemas/job-list';
import { zodFieldErrors } from '@/server/api/errors';

export const metadata: Metadata = { title: 'Jobs' };

const LEAD = 'Every customer job with its cut list, drawer schedules and plans.';

/** The jobs list: the view in the URL is checked here, and its first page rendered on the server. */
export default async function JobsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser('jobs:read');
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const parsed = jobListQuerySchema.safeParse(raw);
  if (!parsed.success) {
    return (
      <>
        <PageHeader title="Jobs" lead={LEAD} />
        <div role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          <p>This link’s view of the jobs list does not work:</p>
          <ul className="ml-5 list-disc">
            {Object.entries(zodFieldErrors(parsed.error)).map(([field, messages]) => (
              <li key={field}>{messages.join(' ')}</li>
            ))}
          </ul>
          <Link href="/jobs" className="underline">
            Show the jobs list
          </Link>
        </div>
      </>
    );
  }
  const db = await getDb();
  const scope = scopeOf(db, user);
  const [settings, initial] = await Promise.all([currentShopSettings(user.shopId), listJobsPage(scope, parsed.data)]);
  return (
    <>
      <PageHeader title="Jobs" lead={LEAD} />
      <Suspense>
        <JobsBoard canWrite={can(user.role, 'jobs:write')} timeZone={settings?.timeZone ?? 'UTC'} initial={initial} initialQuery={parsed.data} />
      </Suspense>
    </>
  );
}
