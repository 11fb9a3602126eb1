/**
 * Cutters never see prices (PRODUCT.md, roles): every route a cutter may call, called as the cutter, with its JSON
 * walked at every depth for a key that looks like money. Not route by route: a new route is in the authorization
 * table, so it is in here.
 */
import path from 'node:path';
import { describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request } from '../support/fixtures';
import { uniqueEmail } from '../support/unique';
import type { AuthzRow } from './authz/types';

let handle: DbHandle;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ handle, fx } = app));

// A lip amount (frontLipAmount) is a length, not money.
const MONEY_KEY = /cost|price|cents|^amount|money|valuation|spend/i;

/** Paths of money-like keys anywhere in a JSON value. */
export function moneyPaths(value: unknown, at = '$'): string[] {
  if (Array.isArray(value)) return value.flatMap((v, i) => moneyPaths(v, `${at}[${i}]`));
  if (value && typeof value === 'object') {
    return Object.entries(value).flatMap(([k, v]) => [...(MONEY_KEY.test(k) ? [`${at}.${k}`] : []), ...moneyPaths(v, `${at}.${k}`)]);
  }
  return [];
}

const TABLE: AuthzRow[] = Object.values(import.meta.glob<{ rows?: AuthzRow[] }>('./authz/*.ts', { eager: true })).flatMap((m) => m.rows ?? []);
const cutterRoutes = TABLE.filter((r) => r.expect.cutter >= 200 && r.expect.cutter < 300);

describe('nothing a cutter may call answers with a price', () => {
  test('the walker finds money at any depth (it is not blind)', () => {
    expect(moneyPaths({ a: [{ b: { costCents: 1 } }], priceEach: 2, length: 3 })).toEqual(['$.a[0].b.costCents', '$.priceEach']);
  });

  test('the cutter may call enough routes for this to mean something', () => {
    expect(cutterRoutes.length).toBeGreaterThan(8);
    expect(cutterRoutes.map((r) => `${r.method} ${r.route}`)).toEqual(
      expect.arrayContaining(['POST /api/offcuts', 'POST /api/offcuts/[id]/scrap', 'GET /api/stock']),
    );
  });

  test.each(cutterRoutes)('$method $route as the cutter: no money-like key in the answer', async ({ route, method, body, target }) => {
    const params = target ? await target({ ...fx, db: handle.db }) : {};
    const url = Object.entries(params).reduce((u, [k, v]) => u.replace(`[${k}]`, v), route);
    const mod = (await import(/* @vite-ignore */ path.resolve('app/api', route.slice('/api/'.length), 'route.ts'))) as Record<
      string,
      (req: Request, ctx: unknown) => Promise<Response>
    >;
    const payload = body === undefined ? undefined : JSON.parse(JSON.stringify(body).replace('EMAIL', uniqueEmail('cutter')));
    const res = await mod[method](await request(url, { method, body: payload, user: fx.cutter }), { params: Promise.resolve(params) });
    expect(res.status).toBeLessThan(300);
    const type = res.headers.get('content-type') ?? '';
    if (type.startsWith('text/csv')) {
      // The cut-list file: no column header that looks like money.
      const header = (await res.text()).replace(/^\uFEFF/, '').split(/\r?\n/)[0];
      expect(header.split(',').filter((h) => MONEY_KEY.test(h))).toEqual([]);
      return;
    }
    if (!type.includes('json')) {
      // The saw order and part tags: compressed PDF streams, not walked here (they print from the plan's parts).
      expect(type).toBe('application/pdf');
      return;
    }
    expect(moneyPaths(await res.json())).toEqual([]);
  });
});
