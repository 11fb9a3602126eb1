import { serverEnv } from '@/lib/env';
import { mailConfig } from '@/lib/mail/config';
import { startMailService, stopMailService } from '@/lib/mail/service';
import { paymentsConfig } from '@/lib/payments/config';
import { startQuoteExpiry, stopQuoteExpiry } from '@/lib/quotes/expiry';
import path from 'node:path';
import { startDigestScheduler, stopDigestScheduler } from '@/lib/buying/digest-service';
import { closeDb, getDbHandle } from './client';
import { serveLiveBackups, type LiveBackupServer } from './live-backup';

/**
 * Refuses to start without a sound environment and database; starts the mail sender, the quote expiry round and
 * the low-stock digest; closes them on shutdown.
 */
export async function startServer() {
  let backups: LiveBackupServer | undefined;
  try {
    serverEnv();
    mailConfig();
    paymentsConfig();
    const handle = await getDbHandle();
    await startMailService(handle.db);
    startQuoteExpiry(handle.db);
    // The embedded database answers `npm run backup` while the server runs (without it, the server still serves).
    if (handle.dump) {
      const served = await serveLiveBackups(path.resolve(serverEnv().KERFWISE_DATA_DIR, 'pglite'), handle.dump).catch((error: Error) => ({
        error: `Backups while the server runs are off: ${error.message}`,
      }));
      if ('error' in served) console.error(served.error);
      else backups = served;
    }
    startDigestScheduler(handle.db);
  } catch (error) {
    console.error((error as Error).message);
    process.exit(1);
  }
  const shutdown = () => {
    stopQuoteExpiry();
    stopDigestScheduler()
      .then(() => backups?.close())
      .then(() => stopMailService())
      .catch(() => undefined)
      .then(() => closeDb())
      .finally(() => process.exit(0));
  };
  process.once('SIGTERM', shutdown);
  process.once('SIGINT', shutdown);
}
