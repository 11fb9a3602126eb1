import { createHash } from 'node:crypto';
import { fillPlaceholders, sql, type SQL, type SQLWrapper } from 'drizzle-orm';
import { PgDialect } from 'drizzle-orm/pg-core';
import type { PGlite } from '@electric-sql/pglite';
import type { Pool } from 'pg';
import type { Db } from './open';

/**
 * A read statement worth preparing once: the hot reads of every page view (the jobs list, a plan). Its SQL is built
 * by drizzle once, with named placeholders; each call only binds values. The database keeps it prepared too, so it
 * is parsed once and, after a few runs, planned once:
 *
 * - on the embedded database, one protocol message (parse the first time, then bind, describe, execute, sync) in
 *   one call into PGlite, under the same two locks as `PGlite.query` (never inside someone's open transaction);
 *   PGlite's own `query` makes six calls and parses and plans the text each time, which for the jobs list was most
 *   of its cost;
 * - on PostgreSQL, node-postgres's named statements (each pooled connection prepares it on first use);
 * - in a transaction (`tx` has no client of its own), or on any other driver, the same SQL through `db.execute`.
 *
 * Statements return json, text and numbers only (timestamps as ISO text in SQL), so every path hands back the same
 * values. Nothing is kept but the statement's text: no rows, no results.
 */
export class PreparedRead<V extends Record<string, unknown>> {
  readonly name: string;
  readonly text: string;
  private readonly params: unknown[];

  /** `build` gets a function that names a value: a placeholder when building once, the value itself otherwise. */
  constructor(private readonly build: (value: <K extends keyof V & string>(key: K) => SQLWrapper | V[K]) => SQL) {
    const query = new PgDialect().sqlToQuery(build((key) => sql.placeholder(key)));
    this.text = query.sql;
    this.params = query.params;
    this.name = `kw_${createHash('sha256').update(this.text).digest('hex').slice(0, 24)}`;
  }

  /** The rows for these values. */
  async rows(db: Db, values: V): Promise<Record<string, unknown>[]> {
    const client = (db as { $client?: unknown }).$client;
    const params = fillPlaceholders(this.params, values);
    if (isPglite(client)) return runOnPglite(client, this, params);
    if (isPool(client)) return (await client.query({ name: this.name, text: this.text, values: params })).rows;
    const result = (await db.execute(this.build((key) => values[key]))) as unknown as { rows: Record<string, unknown>[] };
    return result.rows;
  }
}

/** A timestamp column as the app's ISO text (what `Date#toISOString` writes), made by the database. */
export const isoText = (column: SQLWrapper) => sql`to_char(${column} at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')`;

function isPglite(client: unknown): client is PGlite {
  return typeof (client as PGlite | undefined)?.execProtocol === 'function' && typeof (client as PGlite)._runExclusiveQuery === 'function';
}

function isPool(client: unknown): client is Pool {
  return (
    typeof (client as Pool | undefined)?.query === 'function' && typeof (client as Pool).connect === 'function' && 'totalCount' in (client as Pool)
  );
}

/**
 * The statements each embedded database has prepared (a test process may open several). On globalThis: Next.js
 * bundles this module once per route, page and proxy, and all of them share the one database of the process.
 */
const holder = globalThis as typeof globalThis & { __kerfwisePrepared?: WeakMap<PGlite, Set<string>> };

let protocol: typeof import('@electric-sql/pglite') | undefined;

async function runOnPglite(client: PGlite, statement: PreparedRead<never>, params: unknown[]): Promise<Record<string, unknown>[]> {
  protocol ??= await import('@electric-sql/pglite');
  const { serialize } = protocol.protocol;
  const preparedOn = (holder.__kerfwisePrepared ??= new WeakMap());
  let prepared = preparedOn.get(client);
  if (!prepared) preparedOn.set(client, (prepared = new Set()));
  const run = async (parse: boolean) => {
    const { messages } = await client.execProtocol(
      concat([
        ...(parse ? [serialize.parse({ name: statement.name, text: statement.text, types: [] })] : []),
        serialize.bind({ statement: statement.name, values: params.map(toText) }),
        serialize.describe({ type: 'P' }),
        serialize.execute({}),
        serialize.sync(),
      ]),
      {},
    );
    prepared.add(statement.name);
    return protocol!.parse.parseResults(messages, client.parsers)[0]?.rows ?? [];
  };
  // The same locks, in the same order, as PGlite's own query: no statement of ours lands inside an open transaction.
  return client._runExclusiveTransaction(() =>
    client._runExclusiveQuery(async () => {
      try {
        return await run(!prepared.has(statement.name));
      } catch (error) {
        // Prepared already (by a copy of this module that did not tell us): run it.
        if ((error as { code?: string }).code === '42P05') return run(false);
        // Whatever else failed (the parse, or a run that invalidated the statement), start from the text next time.
        prepared.delete(statement.name);
        await client.execProtocol(concat([serialize.close({ type: 'S', name: statement.name }), serialize.sync()]), { throwOnError: false });
        throw error;
      }
    }),
  ) as Promise<Record<string, unknown>[]>;
}

/** Values go as text, as PGlite's own query sends them. */
function toText(value: unknown): string | null {
  if (value == null) return null;
  if (value instanceof Date) return value.toISOString();
  if (typeof value === 'object') return JSON.stringify(value);
  return String(value);
}

function concat(parts: Uint8Array[]): Uint8Array {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}
