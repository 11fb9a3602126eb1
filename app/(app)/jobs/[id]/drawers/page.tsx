import type { Metadata } from 'next';
import { DrawerSchedulesSection } from '@/components/drawer-schedules/drawer-schedules-section';
import { can } from '@/lib/auth/permissions';
import { jobSection } from '../job-section';

export const metadata: Metadata = { title: 'Drawer schedules' };

export default async function DrawerSchedulesPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, jobId, shop } = await jobSection(params, 'jobs:read');
  return <DrawerSchedulesSection jobId={jobId} units={shop.units} canWrite={can(user.role, 'cutlist:write')} />;
}
