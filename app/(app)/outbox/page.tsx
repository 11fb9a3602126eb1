import type { Metadata } from 'next';
import Link from 'next/link';
import { getDb } from '@/db/client';
import { MAIL_KIND_LABELS, OutboxStatusBadge } from '@/components/mail/outbox-status';
import { RetryMailButton } from '@/components/mail/retry-mail-button';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/session';
import { mailConfig } from '@/lib/mail/config';
import { shopOutbox } from '@/lib/mail/outbox';

export const metadata: Metadata = { title: 'Outbox' };

const when = (iso: string) => new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short', timeZone: 'UTC' }) + ' UTC';

export default async function OutboxPage() {
  const user = await requirePageUser('mail:manage');
  const entries = await shopOutbox(await getDb(), user.shopId);
  const failed = entries.filter((e) => e.status === 'failed');
  const demo = mailConfig().mode === 'catcher';
  return (
    <>
      <PageHeader
        title="Outbox"
        lead="Every mail Kerfwise sends for the shop — invites, password resets, quotes — and how its delivery went. A mail the server could not deliver waits and is tried again; one the receiving server refused is marked failed with its reason."
        actions={demo ? <Link href="/sent-mail" className="btn-quiet">Sent mail (demo)</Link> : undefined}
      />
      {failed.length > 0 && (
        <p role="alert" className="mb-4 rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          {failed.length === 1 ? '1 mail could not be delivered.' : `${failed.length} mails could not be delivered.`} Check the address, then try again.
        </p>
      )}
      {entries.length === 0 ? (
        <EmptyState title="No mail yet.">Invites and password resets appear here as soon as they are sent.</EmptyState>
      ) : (
        <div className="card overflow-x-auto">
          <table className="data-table" aria-label="Outbox">
            <thead>
              <tr>
                <th>Queued</th>
                <th>To</th>
                <th>Subject</th>
                <th>Status</th>
                <th />
              </tr>
            </thead>
            <tbody>
              {entries.map((e) => (
                <tr key={e.id}>
                  <td className="num whitespace-nowrap text-graphite-mute">{when(e.createdAt)}</td>
                  <td className="break-all">{e.to}</td>
                  <td>
                    <span className="font-medium">{e.subject}</span>
                    <span className="block text-xs text-graphite-mute">{MAIL_KIND_LABELS[e.kind] ?? e.kind}</span>
                    {e.status !== 'sent' && e.lastError && (
                      <span className={`mt-1 block text-xs ${e.status === 'failed' ? 'text-brick' : 'text-graphite-mute'}`}>
                        {e.status === 'pending' ? `Attempt ${e.attempts} did not go through (${e.lastError}); next try ${when(e.nextAttemptAt)}.` : e.lastError}
                      </span>
                    )}
                  </td>
                  <td>
                    <OutboxStatusBadge status={e.status} />
                    {e.sentAt && <span className="num block text-xs text-graphite-mute">{when(e.sentAt)}</span>}
                  </td>
                  <td className="text-right">{e.status === 'failed' && <RetryMailButton id={e.id} subject={e.subject} />}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </>
  );
}
