import { serverEnv } from '@/lib/env';
import { mailConfig } from '@/lib/mail/config';
import { startMailService, stopMailService } from '@/lib/mail/service';
import { paymentsConfig } from '@/lib/payments/config';
import { startQuoteExpiry, stopQuoteExpiry } from '@/lib/quotes/expiry';
import { closeDb, getDbHandle } from './client';

/**
 * Refuses to start without a sound environment and database; starts the mail sender and the quote expiry round;
 * closes them on shutdown.
 */
export async function startServer() {
  try {
    serverEnv();
    mailConfig();
    paymentsConfig();
    const handle = await getDbHandle();
    await startMailService(handle.db);
    startQuoteExpiry(handle.db);
  } catch (error) {
    console.error((error as Error).message);
    process.exit(1);
  }
  const shutdown = () => {
    stopQuoteExpiry();
    stopMailService()
      .catch(() => undefined)
      .then(() => closeDb())
      .finally(() => process.exit(0));
  };
  process.once('SIGTERM', shutdown);
  process.once('SIGINT', shutdown);
}
