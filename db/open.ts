import fs from 'node:fs';
import path from 'node:path';
import { sql } from 'drizzle-orm';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import * as schema from './schema';
import { acquireDirectoryLock } from './lock';
import { ChangeFeed, CHANGES_CHANNEL, WATCHED_TABLES } from './changes';

export type Schema = typeof schema;
/** The one database type the app codes against: PGlite and node-postgres both satisfy it. */
export type Db = PgDatabase<PgQueryResultHKT, Schema>;

export interface DbHandle {
  db: Db;
  kind: 'pglite' | 'postgres';
  /** The PostgreSQL server's address, for a handle on one (tests open other clients on it). */
  url?: string;
  close(): Promise<void>;
  /** An embedded database on disk: a gzipped tar of its directory, made between queries (db/live-backup.ts). */
  dump?: () => Promise<Blob>;
  /**
   * The embedded database's change feed (db/changes.ts), once its triggers are there; never for PostgreSQL, whose
   * server other app servers share.
   */
  changes?: ChangeFeed;
  /** Embedded only: subscribes to a notification channel (LISTEN). */
  listen?: (channel: string, onNotice: (payload: string) => void) => Promise<unknown>;
}

export interface OpenOptions {
  /** `postgres://…` for a PostgreSQL server; otherwise the embedded database is used. */
  url?: string;
  /** Embedded database directory, or `memory://` for a throw-away in-memory database. */
  dataDir?: string;
  migrate?: boolean;
}

export const MIGRATIONS_FOLDER = path.resolve(process.cwd(), 'db/migrations');

export async function openDatabase(options: OpenOptions = {}): Promise<DbHandle> {
  const handle =
    options.url && /^postgres(ql)?:\/\//.test(options.url) ? await openPostgres(options.url) : await openPglite(options.dataDir ?? './data/pglite');
  if (options.migrate !== false) {
    try {
      await runMigrations(handle);
    } catch (error) {
      await handle.close();
      throw error;
    }
  }
  if (handle.listen) await startChangeFeed(handle);
  return handle;
}

/**
 * Listens for the change triggers' notices, if the triggers are there (a database not yet migrated that far gets no
 * feed, so nothing is kept between requests). Safe to call again after a late migration.
 */
export async function startChangeFeed(handle: DbHandle): Promise<void> {
  if (handle.changes || !handle.listen) return;
  const names = WATCHED_TABLES.map((t) => `kerfwise_changes_${t}`);
  const found = (await handle.db.execute(sql`select count(*)::int as n from pg_trigger where tgname in ${names}`)) as unknown as {
    rows: { n: number }[];
  };
  if (Number(found.rows[0].n) !== names.length) return;
  const feed = new ChangeFeed();
  await handle.listen(CHANGES_CHANNEL, (table) => feed.changed(table));
  handle.changes = feed;
}

async function openPglite(dataDir: string): Promise<DbHandle> {
  const { PGlite } = await import('@electric-sql/pglite');
  const { drizzle } = await import('drizzle-orm/pglite');
  if (dataDir === 'memory://') {
    const client = new PGlite();
    await client.waitReady;
    return {
      db: drizzle({ client, schema }) as unknown as Db,
      kind: 'pglite',
      close: () => client.close(),
      listen: (channel, onNotice) => client.listen(channel, onNotice),
    };
  }
  const dir = path.resolve(dataDir);
  // PGlite creates only the last path segment.
  fs.mkdirSync(path.dirname(dir), { recursive: true });
  const release = acquireDirectoryLock(`${dir}.lock`);
  try {
    const client = new PGlite(dir);
    await client.waitReady;
    return {
      db: drizzle({ client, schema }) as unknown as Db,
      kind: 'pglite',
      listen: (channel, onNotice) => client.listen(channel, onNotice),
      close: async () => {
        await client.close();
        release();
      },
      dump: async () => {
        // Data pages written out first, so the copy starts without replaying the log.
        await client.exec('CHECKPOINT');
        return client.dumpDataDir('gzip');
      },
    };
  } catch (error) {
    release();
    throw error;
  }
}

async function openPostgres(url: string): Promise<DbHandle> {
  const { Pool } = await import('pg');
  const { drizzle } = await import('drizzle-orm/node-postgres');
  const pool = new Pool({ connectionString: url, max: 10 });
  // An idle connection the server ends (a restart, an administrator) is dropped from the pool, which opens a new
  // one on the next query; unheard, the pool's 'error' event would take the whole process down.
  pool.on('error', (error) => console.error(`PostgreSQL closed an idle connection (${error.message}); the next query opens a new one.`));
  return { db: drizzle({ client: pool, schema }) as unknown as Db, kind: 'postgres', url, close: () => pool.end() };
}

/** Applies the migrations of `folder` not yet applied (a test may point it at a copy holding only the first few). */
export async function runMigrations(handle: DbHandle, folder = MIGRATIONS_FOLDER) {
  if (handle.kind === 'pglite') {
    const { migrate } = await import('drizzle-orm/pglite/migrator');
    await migrate(handle.db as never, { migrationsFolder: folder });
  } else {
    const { migrate } = await import('drizzle-orm/node-postgres/migrator');
    await migrate(handle.db as never, { migrationsFolder: folder });
  }
}
