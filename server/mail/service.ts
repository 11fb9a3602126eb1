/**
 * The mail service of one server process: the outbox sender (and, in development with neither SMTP_URL nor a
 * catcher named, a local mail catcher of its own). Started from instrumentation.ts in the Node runtime.
 */
import type { Db } from '@/db/open';
import { startMailCatcher, type MailCatcher } from './catcher';
import { mailConfig } from '@/lib/mail/config';
import { createMailSender, type MailSender } from './sender';

const holder = globalThis as typeof globalThis & { __kerfwiseMail?: { sender: MailSender; catcher: MailCatcher | null } };

export async function startMailService(db: Db): Promise<void> {
  if (holder.__kerfwiseMail) return;
  const config = mailConfig();
  let catcher: MailCatcher | null = null;
  let url: string;
  if (config.mode === 'smtp') {
    url = config.url;
  } else if (config.url) {
    url = config.url;
  } else {
    catcher = await startMailCatcher({ dir: config.dir });
    url = catcher.url;
    console.log(`Mail: no SMTP_URL, so mail goes to a local catcher (${url}) and is stored in ${config.dir}`);
  }
  // KERFWISE_MAIL_CLAIM_MS: how long a claim lasts before another sender takes over (the e2e crash test shortens it).
  const claimMs = Number(process.env.KERFWISE_MAIL_CLAIM_MS) || undefined;
  const sender = createMailSender({ db, transport: url, from: config.from, claimMs });
  sender.start(Number(process.env.KERFWISE_MAIL_POLL_MS) || 1_500);
  holder.__kerfwiseMail = { sender, catcher };
}

/** Starts a sending round now (after a transaction that queued mail has committed); harmless when not started. */
export function wakeMailSender(): void {
  holder.__kerfwiseMail?.sender.wake();
}

export async function stopMailService(): Promise<void> {
  const mail = holder.__kerfwiseMail;
  holder.__kerfwiseMail = undefined;
  if (!mail) return;
  await mail.sender.stop();
  await mail.catcher?.close();
}
