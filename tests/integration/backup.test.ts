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
import { inArray, like } from 'drizzle-orm';
import { seedDemoShop } from '@/seeds/demo-shop';
import { createTestDatabase } from '../support/test-db';

/** Every table of the schema with all its rows, in a fixed order (rows sorted by their JSON text). */
async function everyTable(db: Db): Promise<Record<string, string[]>> {
  const tables = (await db.execute(
    sql`select table_name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE' order by table_name`,
  )) as unknown as { rows: { table_name: string }[] };
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

  test('embedded, while the server holding it runs and writes: the server makes the dump, and the restored copy holds every transaction committed before it, whole, and none after', async () => {
    const root = fs.mkdtempSync(path.join(os.tmpdir(), 'kerfwise-backup-'));
    const dir = path.join(root, 'pglite');
    const file = path.join(root, 'live.tar.gz');
    let h = await openDatabase({ dataDir: dir });
    await seedDemoShop(h.db);
    await h.close();

    // Another process holds the directory, answers backup requests as the server does, and commits one job with
    // three parts per transaction, without pause.
    const server = spawn(process.execPath, ['--import', 'tsx', 'tests/support/serve-database.ts', dir], { stdio: ['pipe', 'pipe', 'inherit'] });
    let wrote = 0;
    let done = -1;
    let ready = false;
    server.stdout.on('data', (d) => {
      for (const line of String(d).split('\n')) {
        if (line === 'ready') ready = true;
        const m = /^(wrote|done) (\d+)$/.exec(line);
        if (m?.[1] === 'wrote') wrote = Number(m[2]);
        if (m?.[1] === 'done') done = Number(m[2]);
      }
    });
    const until = async (what: () => boolean, label: string) => {
      for (let i = 0; i < 1200 && !what(); i++) await new Promise((r) => setTimeout(r, 50));
      if (!what()) throw new Error(`timed out waiting for ${label}`);
    };
    await until(() => ready && wrote >= 20, '20 writes');
    const writesBefore = wrote;
    expect(await backupEmbedded(dir, file)).toEqual({ live: true });
    // Lines of commits made before the dump may still be on their way here: let them arrive (this only loosens the
    // upper bound below).
    await new Promise((r) => setTimeout(r, 200));
    const writesAtReply = wrote;
    await until(() => wrote >= writesAtReply + 20, '20 more writes');
    server.stdin.end();
    await until(() => done > 0, 'the writer to stop');
    await new Promise((r) => (server.exitCode === null ? server.on('exit', r) : r(null)));
    expect(fs.existsSync(`${dir}.sock`)).toBe(false);

    const restoredDir = path.join(root, 'restored', 'pglite');
    fs.mkdirSync(path.dirname(restoredDir));
    await restoreEmbedded(restoredDir, file);
    const restored = await openDatabase({ dataDir: restoredDir, migrate: false });
    const live = await openDatabase({ dataDir: dir, migrate: false });
    try {
      const writesIn = async (db: Db) =>
        (await db.select({ name: jobs.name }).from(jobs).where(like(jobs.name, 'Live write %')))
          .map((j) => Number(j.name.split(' ')[2]))
          .sort((a, b) => a - b);
      const kept = await writesIn(restored.db);
      const k = kept.length;
      // A prefix of the writes: everything committed up to the dump (at least what was acknowledged before it was
      // asked for, no more than had been acknowledged once it arrived), with no gap.
      expect(k).toBeGreaterThanOrEqual(writesBefore);
      expect(k).toBeLessThanOrEqual(writesAtReply);
      expect(kept).toEqual(Array.from({ length: k }, (_, i) => i + 1));
      expect((await writesIn(live.db)).length).toBe(done);
      expect(done).toBeGreaterThan(k);
      // Every restored write is whole: its three parts and its last update.
      const restoredParts = (await restored.db.execute(
        sql`select count(*)::int as n from parts p join jobs j on j.id = p.job_id where j.name like 'Live write %' and j.notes = 'three parts'`,
      )) as unknown as { rows: { n: number }[] };
      expect(restoredParts.rows[0].n).toBe(3 * k);

      // The live database without the writes after the dump is, table by table and row by row, the restored copy.
      const after = Array.from({ length: done - k }, (_, i) => `Live write ${k + 1 + i}`);
      await live.db.delete(jobs).where(inArray(jobs.name, after));
      expect(await everyTable(restored.db)).toEqual(await everyTable(live.db));
    } finally {
      await restored.close();
      await live.close();
    }
  }, 180_000);

  test('a backup is refused while a server holds the embedded database, saying what to do', async () => {
    const root = fs.mkdtempSync(path.join(os.tmpdir(), 'kerfwise-backup-'));
    const dir = path.join(root, 'pglite');
    // Another process (standing in for the server) holds the directory.
    const holder = spawn(process.execPath, ['--import', 'tsx', 'tests/support/hold-database.ts', dir], { stdio: ['pipe', 'pipe', 'inherit'] });
    await new Promise<void>((resolve, reject) => {
      holder.stdout.on('data', (d) => String(d).includes('ready') && resolve());
      holder.on('exit', (code) => reject(new Error(`holder exited early (${code})`)));
    });
    await expect(backupEmbedded(dir, path.join(root, 'b.tar.gz'))).rejects.toThrow(
      new RegExp(`in use by process ${holder.pid}[^]*Stop the server, then back it up`),
    );
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
