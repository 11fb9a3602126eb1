/**
 * A backup restores: back up, change data, restore, and every table's rows are as they were at the backup. The
 * embedded database always; a PostgreSQL server too when the suite runs on one (TEST_DATABASE_URL).
 */
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { sql } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import { backupEmbedded, backupPostgres, restoreEmbedded, restorePostgres } from '@/db/backup';
import { openDatabase, type Db } from '@/db/open';
import { jobs, shops } from '@/db/schema';
import { seedDemoShop } from '@/seeds/demo-shop';
import { createTestDatabase } from '../support/test-db';

/** Every table of the schema with all its rows, in a fixed order (rows sorted by their JSON text). */
async function everyTable(db: Db): Promise<Record<string, string[]>> {
  const tables = (await db.execute(sql`select table_name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE' order by table_name`)) as unknown as { rows: { table_name: string }[] };
  const out: Record<string, string[]> = {};
  for (const { table_name } of tables.rows) {
    const rows = (await db.execute(sql.raw(`select row_to_json(t)::text as r from "${table_name}" t`))) as unknown as { rows: { r: string }[] };
    out[table_name] = rows.rows.map((x) => x.r).sort();
  }
  return out;
}

async function change(db: Db) {
  const [shop] = await db.select().from(shops).limit(1);
  await db.insert(jobs).values({ shopId: shop.id, name: 'Made after the backup' });
  await db.execute(sql`update stock_items set on_hand = on_hand + 5`);
  await db.execute(sql`delete from audit_events`);
}

describe('backups', () => {
  test('embedded: the data-directory dump restores every table as it was', async () => {
    const root = fs.mkdtempSync(path.join(os.tmpdir(), 'kerfwise-backup-'));
    const dir = path.join(root, 'pglite');
    const file = path.join(root, 'backup.tar.gz');
    let h = await openDatabase({ dataDir: dir });
    await seedDemoShop(h.db);
    const before = await everyTable(h.db);
    await h.close();

    await backupEmbedded(dir, file);
    expect(fs.statSync(file).size).toBeGreaterThan(1000);

    h = await openDatabase({ dataDir: dir });
    await change(h.db);
    expect(await everyTable(h.db)).not.toEqual(before);
    await h.close();

    const { keptAs } = await restoreEmbedded(dir, file);
    expect(keptAs && fs.existsSync(keptAs)).toBe(true);
    h = await openDatabase({ dataDir: dir });
    expect(await everyTable(h.db)).toEqual(before);
    expect(Object.keys(before).length).toBeGreaterThan(10);
    await h.close();
  }, 120_000);

  test('a backup is refused while a server holds the embedded database, saying what to do', async () => {
    const root = fs.mkdtempSync(path.join(os.tmpdir(), 'kerfwise-backup-'));
    const dir = path.join(root, 'pglite');
    // Another process (standing in for the server) holds the directory.
    const holder = spawn(process.execPath, ['--import', 'tsx', 'tests/support/hold-database.ts', dir], { stdio: ['pipe', 'pipe', 'inherit'] });
    await new Promise<void>((resolve, reject) => {
      holder.stdout.on('data', (d) => String(d).includes('ready') && resolve());
      holder.on('exit', (code) => reject(new Error(`holder exited early (${code})`)));
    });
    await expect(backupEmbedded(dir, path.join(root, 'b.tar.gz'))).rejects.toThrow(new RegExp(`in use by process ${holder.pid}[^]*Stop the server, then back it up`));
    expect(fs.existsSync(path.join(root, 'b.tar.gz'))).toBe(false);
    holder.stdin.end();
    await new Promise((resolve) => holder.on('exit', resolve));
  }, 60_000);

  test('the database this run uses (PostgreSQL: pg_dump and pg_restore) restores every table too', async () => {
    const h = await createTestDatabase();
    await seedDemoShop(h.db);
    const before = await everyTable(h.db);
    if (h.url) {
      const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'kerfwise-backup-')), 'backup.pgdump');
      backupPostgres(h.url, file);
      await change(h.db);
      expect(await everyTable(h.db)).not.toEqual(before);
      restorePostgres(h.url, file);
    }
    expect(await everyTable(h.db)).toEqual(before);
    await h.close();
  }, 120_000);
});
