import fs from 'node:fs';
import path from 'node:path';
import { openDatabase } from '../../../db/open';
import { seedDemoShop } from '../../../seeds/demo-shop';
import { startMailCatcher } from '../../../server/mail/catcher';
import { newWebhookSecret } from '../../../lib/payments/config';
import { startPaymentsFake } from '../../../server/payments/fake';
import { E2E_DATA, E2E_DIR, E2E_MAIL, E2E_URL, MAIL_CATCHER_FILE, PAYMENTS_FILE, startServer, stopServer } from './server';

/**
 * A fresh data directory with the demo shop, a local mail catcher storing into its `mail/` and the local payments
 * fake posting its webhooks to the app (both live in the Playwright runner, so they outlast a server restart), and
 * the built app serving it.
 */
export default async function globalSetup() {
  await stopServer();
  fs.rmSync(E2E_DIR, { recursive: true, force: true });
  fs.mkdirSync(E2E_DIR, { recursive: true });
  const db = await openDatabase({ dataDir: path.join(E2E_DATA, 'pglite') });
  try {
    await seedDemoShop(db.db);
  } finally {
    await db.close();
  }
  const catcher = await startMailCatcher({ dir: E2E_MAIL });
  fs.writeFileSync(MAIL_CATCHER_FILE, catcher.url);
  const webhookSecret = newWebhookSecret();
  const fake = await startPaymentsFake({ webhookUrl: `${E2E_URL}/api/payments/webhook`, webhookSecret });
  fs.writeFileSync(PAYMENTS_FILE, JSON.stringify({ url: fake.url, webhookSecret }));
  await startServer();
  return async () => {
    await catcher.close();
    await fake.close();
  };
}
