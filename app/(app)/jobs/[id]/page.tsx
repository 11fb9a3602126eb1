import type { Metadata } from 'next';
import { CutListSection } from '@/components/cut-list/cut-list-section';
import { can } from '@/lib/auth/permissions';
import { jobSection } from './job-section';

export const metadata: Metadata = { title: 'Cut list' };

export default async function JobPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, jobId, shop } = await jobSection(params, 'jobs:read');
  return <CutListSection jobId={jobId} units={shop.units} canWrite={can(user.role, 'cutlist:write')} />;
}
