import { serverEnv } from '@/lib/env';
import { closeDb, getDbHandle } from './client';

/** Refuses to start without a sound environment and database; closes the database (and its lock) on shutdown. */
export async function startServer() {
  try {
    serverEnv();
    await getDbHandle();
  } catch (error) {
    console.error((error as Error).message);
    process.exit(1);
  }
  const shutdown = () => {
    closeDb().finally(() => process.exit(0));
  };
  process.once('SIGTERM', shutdown);
  process.once('SIGINT', shutdown);
}
