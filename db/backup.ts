/**
 * Backups that restore: one file per backup. The embedded database is dumped with PGlite's own data-directory dump
 * (a gzipped tar of the directory); a PostgreSQL server with `pg_dump` in its custom format, put back with
 * `pg_restore`. The embedded directory is backed up by the server that holds it while it runs (db/live-backup.ts),
 * or directly when none does; it is restored only while no server holds it (its lock says so): PGlite is one
 * process's database.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { acquireDirectoryLock } from './lock';
import { backupSocketPath, requestLiveDump } from './live-backup';

/**
 * Writes a backup of the embedded database in `dataDir` to `file`: dumped here when no process holds the directory,
 * or by the running server that holds it, asked over its local socket (db/live-backup.ts). The file appears whole or
 * not at all. Says which it was.
 */
export async function backupEmbedded(dataDir: string, file: string): Promise<{ live: boolean }> {
  const dir = path.resolve(dataDir);
  if (!fs.existsSync(dir)) throw new Error(`There is no embedded database at ${dir}.`);
  let release: () => void;
  try {
    release = acquireDirectoryLock(`${dir}.lock`);
  } catch (error) {
    const live = await requestLiveDump(dir);
    if (!live)
      throw new Error(
        `${(error as Error).message}\nIt does not answer backup requests on ${backupSocketPath(dir)} (not a Kerfwise server, or an older one). Stop the server, then back it up.`,
      );
    writeWhole(file, live);
    return { live: true };
  }
  try {
    const { PGlite } = await import('@electric-sql/pglite');
    const client = new PGlite(dir);
    await client.waitReady;
    const dump = await client.dumpDataDir('gzip');
    await client.close();
    writeWhole(file, Buffer.from(await dump.arrayBuffer()));
    return { live: false };
  } finally {
    release();
  }
}

/** Written beside the target and renamed into place: a backup cut short leaves no file that looks like one. */
function writeWhole(file: string, bytes: Buffer) {
  const partial = `${file}.partial`;
  fs.writeFileSync(partial, bytes, { mode: 0o600 });
  fs.renameSync(partial, file);
}

/** Puts a backup back; the directory it replaces is kept beside it (`<dir>.before-restore-<time>`). */
export async function restoreEmbedded(dataDir: string, file: string): Promise<{ keptAs: string | null }> {
  const dir = path.resolve(dataDir);
  const bytes = fs.readFileSync(file);
  const release = lockOrExplain(dir, 'restore it');
  try {
    let keptAs: string | null = null;
    if (fs.existsSync(dir)) {
      keptAs = `${dir}.before-restore-${new Date().toISOString().replace(/[:.]/g, '-')}`;
      fs.renameSync(dir, keptAs);
    }
    const { PGlite } = await import('@electric-sql/pglite');
    const client = new PGlite(dir, { loadDataDir: new Blob([bytes]) });
    await client.waitReady;
    await client.query('select 1');
    await client.close();
    return { keptAs };
  } finally {
    release();
  }
}

function lockOrExplain(dir: string, what: string): () => void {
  try {
    return acquireDirectoryLock(`${dir}.lock`);
  } catch (error) {
    throw new Error(`${(error as Error).message}\nStop the server, then ${what}.`);
  }
}

/** Debian's PostgreSQL client programs (newest installed version), or the ones on PATH. */
export function postgresTool(name: 'pg_dump' | 'pg_restore'): string {
  const root = '/usr/lib/postgresql';
  if (fs.existsSync(root)) {
    const versions = fs
      .readdirSync(root)
      .filter((v) => fs.existsSync(path.join(root, v, 'bin', name)))
      .sort((a, b) => Number(b) - Number(a));
    if (versions.length) return path.join(root, versions[0], 'bin', name);
  }
  return name;
}

export function backupPostgres(url: string, file: string): void {
  const res = spawnSync(postgresTool('pg_dump'), ['--format=custom', '--no-owner', '--file', file, '--dbname', url], { encoding: 'utf8' });
  if (res.status !== 0) throw new Error(`pg_dump failed: ${res.stderr || res.error?.message}`);
}

export function restorePostgres(url: string, file: string): void {
  const res = spawnSync(postgresTool('pg_restore'), ['--clean', '--if-exists', '--no-owner', '--single-transaction', '--dbname', url, file], {
    encoding: 'utf8',
  });
  if (res.status !== 0) throw new Error(`pg_restore failed: ${res.stderr || res.error?.message}`);
}
