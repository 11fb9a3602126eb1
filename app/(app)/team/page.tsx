import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { getDb } from '@/db/client';
import { TeamManager } from '@/components/team/team-manager';
import { shopOutbox } from '@/server/mail/outbox';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/server/auth/session';

export const metadata: Metadata = { title: 'Team' };

export default async function TeamPage() {
  const user = await requirePageUser('team:manage');
  const failed = (await shopOutbox(scopeOf(await getDb(), user), { failedOnly: true, limit: 20 })).filter(
    (m) => m.kind === 'invite' || m.kind === 'password-reset',
  );
  return (
    <>
      <PageHeader
        title="Team"
        lead="Who works in Kerfwise and what each may do. A change of role or a deactivation takes effect on that person’s next click."
      />
      {failed.length > 0 && (
        <p role="alert" className="mb-4 rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          {failed.length === 1
            ? `The mail to ${failed[0].to} could not be delivered`
            : `${failed.length} invite or reset mails could not be delivered`}
          : {failed[0].lastError}{' '}
          <Link href="/outbox" className="underline">
            See the outbox
          </Link>
        </p>
      )}
      <TeamManager selfId={user.id} />
    </>
  );
}
