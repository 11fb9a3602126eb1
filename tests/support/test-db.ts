import { randomBytes } from 'node:crypto';
import { openDatabase, type DbHandle } from '@/db/open';

/**
 * A fresh, migrated database for one test file: in-memory PGlite by default, or a new database on the PostgreSQL
 * server named by TEST_DATABASE_URL (CI runs the integration suite both ways).
 */
export async function createTestDatabase({ migrate = true }: { migrate?: boolean } = {}): Promise<DbHandle> {
  const serverUrl = process.env.TEST_DATABASE_URL;
  if (!serverUrl) return openDatabase({ dataDir: 'memory://', migrate });

  const { Client } = await import('pg');
  const name = `kerfwise_test_${randomBytes(6).toString('hex')}`;
  const admin = new Client({ connectionString: serverUrl });
  await admin.connect();
  await admin.query(`create database ${name}`);
  await admin.end();

  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  const handle = await openDatabase({ url: url.toString(), migrate });
  return {
    ...handle,
    close: async () => {
      // The pool has ended its connections; plain DROP DATABASE waits (up to 5 s) for their backends to exit,
      // where WITH (FORCE) would terminate them mid-goodbye and the client would hear 57P01.
      await handle.close();
      const dropper = new Client({ connectionString: serverUrl });
      await dropper.connect();
      await dropper.query(`drop database if exists ${name}`);
      await dropper.end();
    },
  };
}
