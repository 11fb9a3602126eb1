import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { MIGRATIONS_FOLDER, runMigrations, type DbHandle } from '@/db/open';
import { createTestDatabase } from './test-db';

/**
 * A test database migrated up to, not including, the first migration that `isTarget` picks (by its tag and SQL), so a
 * test can write rows as the code before it wrote them; `runMigrations(handle)` then runs the rest over them.
 */
export async function databaseBefore(isTarget: (tag: string, sql: string) => boolean, what: string): Promise<DbHandle> {
  const journal = JSON.parse(fs.readFileSync(path.join(MIGRATIONS_FOLDER, 'meta/_journal.json'), 'utf8')) as { entries: { tag: string }[] };
  const sqlOf = (tag: string) => fs.readFileSync(path.join(MIGRATIONS_FOLDER, `${tag}.sql`), 'utf8');
  const index = journal.entries.findIndex((e) => isTarget(e.tag, sqlOf(e.tag)));
  if (index < 1) throw new Error(`No migration ${what}.`);
  const older = fs.mkdtempSync(path.join(os.tmpdir(), 'kerfwise-migrations-'));
  const handle = await createTestDatabase({ migrate: false });
  try {
    fs.mkdirSync(path.join(older, 'meta'));
    const entries = journal.entries.slice(0, index);
    fs.writeFileSync(path.join(older, 'meta/_journal.json'), JSON.stringify({ ...journal, entries }));
    for (const e of entries) fs.copyFileSync(path.join(MIGRATIONS_FOLDER, `${e.tag}.sql`), path.join(older, `${e.tag}.sql`));
    await runMigrations(handle, older);
    return handle;
  } catch (e) {
    await handle.close();
    throw e;
  } finally {
    fs.rmSync(older, { recursive: true, force: true });
  }
}
