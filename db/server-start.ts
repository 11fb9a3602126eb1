import { serverEnv } from '@/lib/env';
import { mailConfig } from '@/lib/mail/config';
import { startMailService, stopMailService } from '@/lib/mail/service';
import { startDigestScheduler, stopDigestScheduler } from '@/lib/buying/digest-service';
import { closeDb, getDbHandle } from './client';

/** Refuses to start without a sound environment and database; starts the mail sender and the low-stock digest; closes both on shutdown. */
export async function startServer() {
  try {
    serverEnv();
    mailConfig();
    const handle = await getDbHandle();
    await startMailService(handle.db);
    startDigestScheduler(handle.db);
  } catch (error) {
    console.error((error as Error).message);
    process.exit(1);
  }
  const shutdown = () => {
    stopDigestScheduler()
      .then(() => stopMailService())
      .catch(() => undefined)
      .then(() => closeDb())
      .finally(() => process.exit(0));
  };
  process.once('SIGTERM', shutdown);
  process.once('SIGINT', shutdown);
}
