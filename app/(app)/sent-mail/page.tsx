import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { getDb } from '@/db/client';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/server/auth/session';
import { listCaughtMail } from '@/server/mail/caught';
import { shopMessageIds } from '@/server/mail/outbox';
import { mailConfig } from '@/lib/mail/config';

export const metadata: Metadata = { title: 'Sent mail' };

const when = (iso: string | null) =>
  iso ? new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short', timeZone: 'UTC' }) + ' UTC' : '—';
const size = (bytes: number) => (bytes < 1024 ? `${bytes} B` : `${(bytes / 1024).toFixed(1)} KB`);

/**
 * Demo only: the mail the local catcher caught, as the recipient would read it. With a real SMTP server configured
 * there is nothing here to show (the mail is in real mailboxes), so the page does not exist.
 */
export default async function SentMailPage({ searchParams }: { searchParams: Promise<{ m?: string }> }) {
  const user = await requirePageUser('mail:manage');
  const config = mailConfig();
  if (config.mode !== 'catcher') notFound();
  const db = await getDb();
  // The catcher holds every shop's mail; show only this shop's.
  const mine = await shopMessageIds(scopeOf(db, user));
  const mails = (await listCaughtMail(config.dir)).filter((m) => m.messageId && mine.has(m.messageId));
  const { m } = await searchParams;
  const open = mails.find((mail) => mail.id === m) ?? mails[0];

  return (
    <>
      <PageHeader
        title="Sent mail"
        lead="The demo delivers nothing: every mail is caught on this machine and kept here, exactly as a recipient would receive it."
        actions={
          <Link href="/outbox" className="btn-quiet">
            Outbox
          </Link>
        }
      />
      {!open ? (
        <EmptyState title="No mail caught yet.">Invite someone on the Team page: the invite lands here.</EmptyState>
      ) : (
        <div className="grid grid-cols-1 gap-6 lg:grid-cols-[20rem_minmax(0,1fr)]">
          <nav aria-label="Caught mail" className="card self-start overflow-hidden">
            <ul>
              {mails.map((mail) => (
                <li key={mail.id} className="border-b border-paper-edge last:border-b-0">
                  <Link
                    href={`/sent-mail?m=${encodeURIComponent(mail.id)}`}
                    aria-current={mail.id === open.id ? 'true' : undefined}
                    className={`block px-4 py-3 text-sm ${mail.id === open.id ? 'bg-oak-wash' : 'hover:bg-paper-deep'}`}
                  >
                    <span className="block font-medium">{mail.subject || '(no subject)'}</span>
                    <span className="block break-all text-xs text-graphite-mute">{mail.to.join(', ')}</span>
                    <span className="block text-xs text-graphite-mute">{when(mail.date)}</span>
                  </Link>
                </li>
              ))}
            </ul>
          </nav>
          <article aria-label={`Mail: ${open.subject}`} className="flex min-w-0 flex-col gap-4">
            <div className="card p-4 text-sm">
              <h2 className="mb-2 text-lg">{open.subject}</h2>
              <dl className="grid grid-cols-[6rem_minmax(0,1fr)] gap-x-3 gap-y-1">
                <dt className="text-graphite-mute">From</dt>
                <dd className="break-all">{open.from}</dd>
                <dt className="text-graphite-mute">To</dt>
                <dd className="break-all">{open.to.join(', ')}</dd>
                <dt className="text-graphite-mute">Date</dt>
                <dd>{when(open.date)}</dd>
                <dt className="text-graphite-mute">Message-ID</dt>
                <dd className="break-all font-mono text-xs">{open.messageId}</dd>
                {open.attachments.length > 0 && (
                  <>
                    <dt className="text-graphite-mute">Attached</dt>
                    <dd>{open.attachments.map((a) => `${a.filename ?? 'unnamed'} (${a.contentType}, ${size(a.size)})`).join(', ')}</dd>
                  </>
                )}
              </dl>
            </div>
            <section aria-label="Plain-text part" className="card p-4">
              <h3 className="mb-2 text-xs font-semibold uppercase tracking-wide text-graphite-mute">Plain text</h3>
              <pre className="whitespace-pre-wrap break-words font-mono text-sm">{open.text ?? '(none)'}</pre>
            </section>
            <section aria-label="HTML part" className="card p-4">
              <h3 className="mb-2 text-xs font-semibold uppercase tracking-wide text-graphite-mute">HTML</h3>
              {open.html ? (
                // Sandboxed without scripts, forms or same-origin access: the mail's HTML can only be looked at.
                <iframe
                  aria-label={`HTML part of “${open.subject}”`}
                  sandbox=""
                  srcDoc={open.html}
                  className="h-[32rem] w-full rounded border border-paper-edge bg-white"
                />
              ) : (
                <p className="text-sm text-graphite-mute">This mail has no HTML part.</p>
              )}
            </section>
          </article>
        </div>
      )}
    </>
  );
}
