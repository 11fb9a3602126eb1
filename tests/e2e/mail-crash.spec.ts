import fs from 'node:fs';
import { startMailCatcher } from '../../lib/mail/catcher';
import { listCaughtMail } from '../../lib/mail/caught';
import { E2E_MAIL, killServer, MAIL_CATCHER_FILE, startServer, stopServer } from './support/server';
import { signIn } from './support/session';
import { expect, test } from './support/test';

// The server is killed with kill -9 after the mail server has stored a message and before the app hears "accepted"
// (so before it can mark the message sent). After a restart the message goes out once more, with the same
// Message-ID, and is then marked sent.
test('kill -9 between sending and marking: after the restart the invite is resent once, with the same Message-ID', async ({
  page,
  consoleErrors,
}) => {
  test.setTimeout(150_000);
  // The server goes away on purpose (killed, then restarted): the open page's prefetches fail meanwhile.
  consoleErrors.allow(/Failed to load resource: net::ERR_(CONNECTION_RESET|CONNECTION_REFUSED|EMPTY_RESPONSE|INCOMPLETE_CHUNKED_ENCODING)/);
  const usual = fs.readFileSync(MAIL_CATCHER_FILE, 'utf8');
  let armed = true;
  const killing = startMailCatcher({
    dir: E2E_MAIL,
    onStored: () => {
      if (!armed) return;
      armed = false;
      void killServer();
    },
  });
  const catcher = await killing;
  await stopServer();
  fs.writeFileSync(MAIL_CATCHER_FILE, catcher.url);
  // A claim left by a dead sender is taken over after 3 s here (5 minutes normally).
  const shortClaims = { KERFWISE_MAIL_CLAIM_MS: '3000' };
  try {
    await startServer(shortClaims);
    await signIn(page, 'owner');
    const email = `arlo.${Date.now()}@larkspur.example`;
    const res = await page.request.post('/api/team', { data: { name: 'Arlo Brandt', email, role: 'cutter' } });
    expect(res.status()).toBe(201);

    const copies = async () => (await listCaughtMail(E2E_MAIL, 1000)).filter((m) => m.to.includes(email));
    await expect.poll(async () => (await copies()).length, { timeout: 20_000, message: 'the first copy to be stored' }).toBe(1);
    await expect.poll(async () => (await page.request.get('/api/health').catch(() => null))?.status() ?? 0, { timeout: 10_000 }).toBe(0);

    await startServer(shortClaims);
    await expect.poll(async () => (await copies()).length, { timeout: 30_000, message: 'the one resend after the restart' }).toBe(2);
    const [a, b] = await copies();
    expect(a.messageId).toMatch(/^<.+@.+>$/);
    expect(b.messageId).toBe(a.messageId);
    expect(b.text).toBe(a.text);

    await page.goto('/outbox');
    // Marked sent now: a sent message is never claimed again (the integration tests show the third send refused).
    await expect(page.getByRole('listitem').filter({ hasText: email }).getByText('Sent', { exact: true })).toBeVisible({ timeout: 15_000 });
    expect(await copies()).toHaveLength(2);
    await page.goto('about:blank');
  } finally {
    await stopServer();
    await catcher.close();
    fs.writeFileSync(MAIL_CATCHER_FILE, usual);
    await startServer();
  }
});
