/**
 * What the embedded database has changed since a read, for the few reads worth keeping between requests (the
 * session's user, the shop's settings). Only the embedded database has one: one process owns it, and triggers
 * (migration 0013) notify that process when a statement on a watched table commits, before the committing query
 * answers. A PostgreSQL server is shared by several app servers, so there is no feed and nothing is kept: every
 * request reads again.
 */
export const CHANGES_CHANNEL = 'kerfwise_changes';

/** The tables whose triggers notify the channel (migration 0013_change-feed). */
export const WATCHED_TABLES = ['users', 'shops'] as const;
export type WatchedTable = (typeof WATCHED_TABLES)[number];

export class ChangeFeed {
  private readonly versions = new Map<string, number>();

  /** Called with the table's name for each notice (a committed statement on it). */
  changed(table: string): void {
    this.versions.set(table, (this.versions.get(table) ?? 0) + 1);
  }

  /** A number that moves on whenever any of `tables` changes (never back). */
  version(tables: readonly WatchedTable[]): number {
    let sum = 0;
    for (const t of tables) sum += this.versions.get(t) ?? 0;
    return sum;
  }
}

const LIMIT = 1000;

/**
 * Keeps what `load` read under `key` while none of `tables` changed since; with no feed (PostgreSQL), just `load`.
 * The version is taken before the read, so a change committed while the read was in flight makes the kept copy
 * stale at once. At most 1000 entries; past that the store starts afresh.
 */
export class ReadCache<T> {
  /** Per database (a test process may open several). */
  private readonly stores = new WeakMap<ChangeFeed, Map<string, { version: number; value: T }>>();

  constructor(private readonly tables: readonly WatchedTable[]) {}

  async get(feed: ChangeFeed | undefined, key: string, load: () => Promise<T>): Promise<T> {
    if (!feed) return load();
    const version = feed.version(this.tables);
    let entries = this.stores.get(feed);
    if (!entries) this.stores.set(feed, (entries = new Map()));
    const kept = entries.get(key);
    if (kept && kept.version === version) return kept.value;
    const value = await load();
    if (entries.size >= LIMIT) entries.clear();
    entries.set(key, { version, value });
    return value;
  }
}
