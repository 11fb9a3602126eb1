import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import { getDb } from '@/db/client';
import { getShopSettings } from '@/db/queries/shops';
import { SetupCardsManager } from '@/components/setup-cards/setup-cards-manager';
import { PageHeader } from '@/components/ui/page-header';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';

export const metadata: Metadata = { title: 'Setup cards' };

export default async function SetupCardsPage() {
  const user = await requirePageUser('jobs:read');
  const settings = await getShopSettings(scopeOf(await getDb(), user));
  return (
    <>
      <PageHeader
        title="Setup cards"
        lead="The machine settings that cut a good joint, saved per joint and stock thickness. Drawer schedules show the cards they need. Always make a test cut in scrap first."
      />
      <SetupCardsManager units={settings.units} canWrite={can(user.role, 'cutlist:write')} />
    </>
  );
}
