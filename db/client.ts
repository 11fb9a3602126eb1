import { serverEnv } from '@/lib/env';
import { openDatabase, type Db, type DbHandle } from './open';

// One database per process, kept on globalThis so hot reloads in development reuse it.
const holder = globalThis as typeof globalThis & { __kerfwiseDb?: Promise<DbHandle> };

function openFromEnv(): Promise<DbHandle> {
  const env = serverEnv();
  return openDatabase({ url: env.DATABASE_URL, dataDir: env.KERFWISE_DATA_DIR + '/pglite' });
}

export async function getDbHandle(): Promise<DbHandle> {
  holder.__kerfwiseDb ??= openFromEnv().catch((error) => {
    // A failed open must not poison every later request.
    holder.__kerfwiseDb = undefined;
    throw error;
  });
  return holder.__kerfwiseDb;
}

export async function getDb(): Promise<Db> {
  return (await getDbHandle()).db;
}

/** Hands the process an already-open database (integration tests use an in-memory one). */
export function provideDatabase(handle: DbHandle) {
  holder.__kerfwiseDb = Promise.resolve(handle);
}

export async function closeDb() {
  const pending = holder.__kerfwiseDb;
  holder.__kerfwiseDb = undefined;
  if (pending) await (await pending).close();
}
