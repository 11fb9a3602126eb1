import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getShopSettings } from '@/db/queries/shops';
import { DrawerSchedulesSection } from '@/components/drawer-schedules/drawer-schedules-section';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/lib/auth/session';

export const metadata: Metadata = { title: 'Drawer schedules' };

export default async function DrawerSchedulesPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser('jobs:read');
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const settings = await getShopSettings(await getDb(), user.shopId);
  if (!settings) notFound();
  return <DrawerSchedulesSection jobId={id.data} units={settings.units} canWrite={can(user.role, 'cutlist:write')} />;
}
