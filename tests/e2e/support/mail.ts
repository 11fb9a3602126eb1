import { expect } from '@playwright/test';
import { listCaughtMail, type CaughtMail } from '@/lib/mail/caught';
import { E2E_MAIL } from './server';

/** The mail the catcher stored for this address (and, if given, with a subject like this), once it has arrived. */
export async function mailFor(to: string, subject?: RegExp): Promise<CaughtMail> {
  let found: CaughtMail | undefined;
  await expect
    .poll(
      async () => {
        found = (await listCaughtMail(E2E_MAIL)).find((m) => m.to.includes(to) && (!subject || subject.test(m.subject)));
        return Boolean(found);
      },
      { message: `a mail to ${to}${subject ? ` matching ${subject}` : ''} in ${E2E_MAIL}`, timeout: 20_000 },
    )
    .toBe(true);
  return found!;
}
