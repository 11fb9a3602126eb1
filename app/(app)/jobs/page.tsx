import type { Metadata } from 'next';
import { Suspense } from 'react';
import { JobsBoard } from '@/components/jobs/jobs-board';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/session';
import { can } from '@/lib/auth/permissions';
import { getDb } from '@/db/client';
import { getShopSettings } from '@/db/queries/shops';

export const metadata: Metadata = { title: 'Jobs' };

export default async function JobsPage() {
  const user = await requirePageUser('jobs:read');
  const settings = await getShopSettings(await getDb(), user.shopId);
  return (
    <>
      <PageHeader title="Jobs" lead="Every customer job with its cut list, drawer schedules and plans." />
      <Suspense>
        <JobsBoard canWrite={can(user.role, 'jobs:write')} timeZone={settings?.timeZone ?? 'UTC'} />
      </Suspense>
    </>
  );
}
