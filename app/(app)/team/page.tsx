import type { Metadata } from 'next';
import { TeamManager } from '@/components/team/team-manager';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/session';

export const metadata: Metadata = { title: 'Team' };

export default async function TeamPage() {
  const user = await requirePageUser('team:manage');
  return (
    <>
      <PageHeader title="Team" lead="Who works in Kerfwise and what each may do. A change of role or a deactivation takes effect on that person’s next click." />
      <TeamManager selfId={user.id} />
    </>
  );
}
