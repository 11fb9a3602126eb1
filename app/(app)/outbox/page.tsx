import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { getDb } from '@/db/client';
import { MAIL_KIND_LABELS, OutboxStatusBadge } from '@/components/mail/outbox-status';
import { RetryMailButton } from '@/components/mail/retry-mail-button';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/server/auth/session';
import { mailConfig } from '@/lib/mail/config';
import { shopOutbox } from '@/server/mail/outbox';

export const metadata: Metadata = { title: 'Outbox' };

const when = (iso: string) => new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short', timeZone: 'UTC' }) + ' UTC';

export default async function OutboxPage() {
  const user = await requirePageUser('mail:manage');
  const entries = await shopOutbox(scopeOf(await getDb(), user));
  const failed = entries.filter((e) => e.status === 'failed');
  const demo = mailConfig().mode === 'catcher';
  return (
    <>
      <PageHeader
        title="Outbox"
        lead="Every mail Kerfwise sends for the shop — invites, password resets, quotes — and how its delivery went. A mail the server could not deliver waits and is tried again; one the receiving server refused is marked failed with its reason."
        actions={
          demo ? (
            <Link href="/sent-mail" className="btn-quiet">
              Sent mail (demo)
            </Link>
          ) : undefined
        }
      />
      {failed.length > 0 && (
        <p role="alert" className="mb-4 rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          {failed.length === 1 ? '1 mail could not be delivered.' : `${failed.length} mails could not be delivered.`} Check the address, then try
          again.
        </p>
      )}
      {entries.length === 0 ? (
        <EmptyState title="No mail yet.">Invites and password resets appear here as soon as they are sent.</EmptyState>
      ) : (
        <ul aria-label="Outbox" className="card divide-y divide-paper-edge">
          {entries.map((e) => (
            <li key={e.id} aria-label={`${e.subject} to ${e.to}`} className="flex flex-wrap items-start gap-x-6 gap-y-2 px-4 py-3 text-sm">
              <div className="min-w-0 flex-1 basis-72">
                <p className="font-medium">{e.subject}</p>
                <p className="break-all text-graphite-soft">To {e.to}</p>
                <p className="text-xs text-graphite-mute">
                  {MAIL_KIND_LABELS[e.kind] ?? e.kind} · queued <span className="whitespace-nowrap tabular-nums">{when(e.createdAt)}</span>
                </p>
                {e.status !== 'sent' && e.lastError && (
                  <p className={`mt-1 text-xs ${e.status === 'failed' ? 'text-brick' : 'text-graphite-mute'}`}>
                    {e.status === 'pending'
                      ? `Attempt ${e.attempts} did not go through (${e.lastError}); next try ${when(e.nextAttemptAt)}.`
                      : e.lastError}
                  </p>
                )}
              </div>
              <div className="flex items-center gap-3">
                <div>
                  <OutboxStatusBadge status={e.status} />
                  {e.sentAt && <span className="block whitespace-nowrap text-xs tabular-nums text-graphite-mute">{when(e.sentAt)}</span>}
                </div>
                {e.status === 'failed' && <RetryMailButton id={e.id} subject={e.subject} />}
              </div>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
