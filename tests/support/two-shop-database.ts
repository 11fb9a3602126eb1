import { afterAll, beforeAll } from 'vitest';
import { provideDatabase } from '@/db/client';
import type { Db, DbHandle } from '@/db/open';
import { TEST_SECRET, twoShops } from './fixtures';
import { createTestDatabase } from './test-db';

export type TwoShops = Awaited<ReturnType<typeof twoShops>>;
export interface TwoShopDatabase {
  handle: DbHandle;
  db: Db;
  fx: TwoShops;
}

/**
 * For an integration test file: a fresh migrated database (PGlite, or PostgreSQL under TEST_DATABASE_URL) installed
 * as the process's database, so route handlers called directly use it, with the two-shop fixtures and the test
 * session secret. `ready` receives them before the file's first test; the database closes after its last.
 */
export function setUpTwoShopDatabase(ready: (app: TwoShopDatabase) => void) {
  process.env.NEXTAUTH_SECRET = TEST_SECRET;
  let handle: DbHandle | undefined;
  beforeAll(async () => {
    handle = await createTestDatabase();
    provideDatabase(handle);
    ready({ handle, db: handle.db, fx: await twoShops(handle.db) });
  });
  afterAll(() => handle?.close());
}
