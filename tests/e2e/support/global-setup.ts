import fs from 'node:fs';
import path from 'node:path';
import { openDatabase } from '../../../db/open';
import { seedDemoShop } from '../../../seeds/demo-shop';
import { E2E_DATA, E2E_DIR, startServer, stopServer } from './server';

/** A fresh data directory with the demo shop, and the built app serving it. */
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
  await startServer();
}
