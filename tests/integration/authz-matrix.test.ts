import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { useDatabase } from '@/db/client';
import type { DbHandle } from '@/db/open';
import { createTestDatabase } from '../support/test-db';
import { request, TEST_SECRET, twoShops, type TestUser } from '../support/fixtures';
import { uniqueEmail } from '../support/unique';
import { PUBLIC_ROUTES, type Actor, type AuthzFixtures, type AuthzRow } from './authz/types';

process.env.NEXTAUTH_SECRET = TEST_SECRET;

const METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;
const API_DIR = path.resolve('app/api');

// Every feature's rows, from tests/integration/authz/*.ts.
const TABLE: AuthzRow[] = Object.values(import.meta.glob<{ rows?: AuthzRow[] }>('./authz/*.ts', { eager: true })).flatMap((m) => m.rows ?? []);

/** Every route.ts under app/api as its URL pattern. */
function routeFiles(dir = API_DIR): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return routeFiles(full);
    return entry.name === 'route.ts' ? ['/api' + path.dirname(full).slice(API_DIR.length).replaceAll(path.sep, '/')] : [];
  });
}

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;
const loadRoute = (route: string) =>
  import(/* @vite-ignore */ path.join(API_DIR, route.slice('/api'.length), 'route.ts')) as Promise<Record<string, Handler>>;

let handle: DbHandle;
let fx: AuthzFixtures;

beforeAll(async () => {
  handle = await createTestDatabase();
  useDatabase(handle);
  fx = { ...(await twoShops(handle.db)), db: handle.db };
});
afterAll(() => handle.close());

describe('the authorization matrix', () => {
  test('has exactly one row for every route handler (and none for handlers that do not exist)', async () => {
    const exported: string[] = [];
    for (const route of routeFiles()) {
      if (PUBLIC_ROUTES.includes(route)) continue;
      const mod = await loadRoute(route);
      for (const m of METHODS) if (typeof mod[m] === 'function') exported.push(`${m} ${route}`);
    }
    const rows = TABLE.map((r) => `${r.method} ${r.route}`);
    expect(new Set(rows).size).toBe(rows.length);
    expect([...rows].sort()).toEqual([...exported].sort());
  });

  test('names a fixture for every route with path parameters', () => {
    for (const row of TABLE) expect(row.route.includes('[') ? typeof row.target : 'function', `${row.method} ${row.route}`).toBe('function');
  });

  const cases = TABLE.flatMap((row) => (Object.keys(row.expect) as Actor[]).map((actor) => ({ ...row, actor, status: row.expect[actor] })));

  test.each(cases)('$method $route as $actor → $status', async ({ route, method, body, target, actor, status }) => {
    const user: TestUser | undefined = { anonymous: undefined, owner: fx.owner, estimator: fx.estimator, cutter: fx.cutter, other: fx.otherOwner }[
      actor
    ];
    // Each call gets its own target in the first shop, so deletions and role changes never affect later rows.
    const params = target ? await target(fx) : {};
    const url = Object.entries(params).reduce((u, [k, v]) => u.replace(`[${k}]`, v), route);
    const payload = body && JSON.parse(JSON.stringify(body).replace('EMAIL', uniqueEmail('matrix')));
    const handler = (await loadRoute(route))[method];
    const res = await handler(await request(url, { method, body: payload, user }), { params: Promise.resolve(params) });
    expect(res.status, await res.clone().text()).toBe(status);
  });
});
