/**
 * The web edge, at the route wrapper: requests from other sites (403), bodies that are not JSON (415), and bodies
 * over the limit stopped while they stream (413). The same requests are replayed against a running server in
 * tests/e2e/web-edge.spec.ts.
 */
import path from 'node:path';
import { eq } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import { NextRequest } from 'next/server';
import type { DbHandle } from '@/db/open';
import { jobs, users } from '@/db/schema';
import * as teamRoute from '@/app/api/team/route';
import * as teamMemberRoute from '@/app/api/team/[id]/route';
import * as jobRoute from '@/app/api/jobs/[id]/route';
import * as jobsRoute from '@/app/api/jobs/route';
import { MAX_BODY_BYTES } from '@/lib/api/request-guard';
import { useTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request, sessionCookie } from '../support/fixtures';
import { uniqueEmail } from '../support/unique';
import { SIGNED_BY_SERVICE, type AuthzRow } from './authz/types';

let handle: DbHandle;
let fx: TwoShops;
const noParams = { params: Promise.resolve({}) };
const withId = (id: string) => ({ params: Promise.resolve({ id }) });
const EVIL = { origin: 'http://evil.example', 'sec-fetch-site': 'cross-site' };

useTwoShopDatabase((app) => ({ handle, fx } = app));

describe('requests from another site are refused before anything happens', () => {
  test("the owner's cookie with Origin: evil.example cannot promote the cutter (403), and the role stays", async () => {
    const res = await teamMemberRoute.PATCH(
      await request(`/api/team/${fx.cutter.id}`, { method: 'PATCH', body: { role: 'owner' }, user: fx.owner, headers: EVIL }),
      withId(fx.cutter.id),
    );
    expect(res.status).toBe(403);
    expect((await res.json()).error).toMatch(/another site/);
    const [row] = await handle.db.select({ role: users.role }).from(users).where(eq(users.id, fx.cutter.id));
    expect(row.role).toBe('cutter');
  });

  test('a text/plain body (what a cross-site form can send) is a 415, even from the right origin, and no owner is made', async () => {
    const email = uniqueEmail('plain');
    const res = await teamRoute.POST(
      await request('/api/team', {
        method: 'POST',
        rawBody: JSON.stringify({ name: 'Mallory', email, role: 'owner', password: 'a-long-enough-password' }),
        user: fx.owner,
        headers: { 'content-type': 'text/plain' },
      }),
      noParams,
    );
    expect(res.status).toBe(415);
    expect(await handle.db.select().from(users).where(eq(users.email, email))).toEqual([]);
  });

  test('a DELETE with no Origin and Sec-Fetch-Site: cross-site is refused and the job stays', async () => {
    const [job] = await handle.db.insert(jobs).values({ shopId: fx.mine.id, name: 'Kept job' }).returning();
    const res = await jobRoute.DELETE(
      await request(`/api/jobs/${job.id}`, { method: 'DELETE', user: fx.owner, headers: { origin: null, 'sec-fetch-site': 'cross-site' } }),
      withId(job.id),
    );
    expect(res.status).toBe(403);
    expect(await handle.db.select().from(jobs).where(eq(jobs.id, job.id))).toHaveLength(1);
  });

  test('a request with neither Origin nor Sec-Fetch-Site is refused; same-origin alone, or an Origin naming the host it came to, is let through', async () => {
    const none = await jobsRoute.POST(
      await request('/api/jobs', { method: 'POST', body: { name: 'No headers' }, user: fx.owner, headers: { origin: null, 'sec-fetch-site': null } }),
      noParams,
    );
    expect(none.status).toBe(403);
    const sameSite = await jobsRoute.POST(
      await request('/api/jobs', {
        method: 'POST',
        body: { name: 'Same site' },
        user: fx.owner,
        headers: { origin: null, 'sec-fetch-site': 'same-site' },
      }),
      noParams,
    );
    expect(sameSite.status).toBe(403);
    const fetchOnly = await jobsRoute.POST(
      await request('/api/jobs', { method: 'POST', body: { name: 'Fetch metadata' }, user: fx.owner, headers: { origin: null } }),
      noParams,
    );
    expect(fetchOnly.status).toBe(201);
    const byHost = await jobsRoute.POST(
      await request('/api/jobs', {
        method: 'POST',
        body: { name: 'By host' },
        user: fx.owner,
        headers: { origin: 'http://shop.local:3000', host: 'shop.local:3000', 'sec-fetch-site': null },
      }),
      noParams,
    );
    expect(byHost.status).toBe(201);
    const lookalike = await jobsRoute.POST(
      await request('/api/jobs', {
        method: 'POST',
        body: { name: 'Look-alike' },
        user: fx.owner,
        headers: { origin: 'http://shop.local.evil.example:3000', host: 'shop.local:3000' },
      }),
      noParams,
    );
    expect(lookalike.status).toBe(403);
  });

  test('reads are not refused for their origin (a GET changes nothing)', async () => {
    const res = await jobsRoute.GET(await request('/api/jobs', { user: fx.owner, headers: EVIL }), noParams);
    expect(res.status).toBe(200);
  });

  // Every state-changing handler in the authorization table, so a new route cannot forget it.
  const TABLE: AuthzRow[] = Object.values(import.meta.glob<{ rows?: AuthzRow[] }>('./authz/*.ts', { eager: true })).flatMap((m) => m.rows ?? []);
  const writes = TABLE.filter((r) => r.method !== 'GET' && !SIGNED_BY_SERVICE.includes(r.route));
  test.each(writes)('$method $route from another site → 403, with a plain-text body → 415', async ({ route, method, body, target }) => {
    const params = target ? await target({ ...fx, db: handle.db }) : {};
    const url = Object.entries(params).reduce((u, [k, v]) => u.replace(`[${k}]`, v), route);
    const mod = (await import(/* @vite-ignore */ path.resolve('app/api', route.slice('/api/'.length), 'route.ts'))) as Record<
      string,
      typeof jobsRoute.POST
    >;
    const payload = JSON.stringify(body ?? {}).replace('EMAIL', uniqueEmail('edge'));
    const cross = await mod[method](await request(url, { method, rawBody: payload, user: fx.owner, headers: EVIL }), {
      params: Promise.resolve(params),
    } as never);
    expect(cross.status).toBe(403);
    const plain = await mod[method](
      await request(url, { method, rawBody: payload, user: fx.owner, headers: { 'content-type': 'text/plain;charset=UTF-8' } }),
      { params: Promise.resolve(params) } as never,
    );
    expect(plain.status).toBe(415);
  });

  test.each(SIGNED_BY_SERVICE)(
    '%s comes from a service, not a browser: with a browser’s cookie and another site’s headers, it still wants the signature (400)',
    async (route) => {
      const mod = (await import(/* @vite-ignore */ path.resolve('app/api', route.slice('/api/'.length), 'route.ts'))) as Record<
        string,
        typeof jobsRoute.POST
      >;
      const res = await mod.POST(
        await request(route, { method: 'POST', rawBody: '{"id":"evt_forged","type":"checkout.session.completed"}', user: fx.owner, headers: EVIL }),
        noParams,
      );
      expect(res.status).toBe(400);
      expect((await res.json()).error).toMatch(/signed by the payments service/);
    },
  );
});

describe('a body over the limit is stopped while it streams', () => {
  /** A chunked body (no Content-Length) of `total` bytes of JSON-ish text, counting what the server pulls. */
  function streamingRequest(total: number, cookie: string) {
    const chunk = new TextEncoder().encode('x'.repeat(64 * 1024));
    let sent = 0;
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        if (sent >= total) return controller.close();
        sent += chunk.byteLength;
        controller.enqueue(chunk);
      },
    });
    const req = new NextRequest('http://localhost/api/jobs', {
      method: 'POST',
      headers: { cookie, origin: 'http://localhost', 'content-type': 'application/json' },
      body,
      duplex: 'half',
    } as ConstructorParameters<typeof NextRequest>[1]);
    return { req, pulled: () => sent };
  }

  test('a 300 MB chunked body gets a 413 after about the limit has been read, not all of it', async () => {
    const { req, pulled } = streamingRequest(300_000_000, await sessionCookie(fx.owner));
    const res = await jobsRoute.POST(req, noParams);
    expect(res.status).toBe(413);
    expect((await res.json()).error).toMatch(/too large/);
    expect(pulled()).toBeLessThan(MAX_BODY_BYTES + 4 * 64 * 1024);
  });

  test('a declared Content-Length over the limit is refused without reading', async () => {
    const res = await jobsRoute.POST(
      await request('/api/jobs', { method: 'POST', body: { name: 'x' }, user: fx.owner, headers: { 'content-length': String(MAX_BODY_BYTES + 1) } }),
      noParams,
    );
    expect(res.status).toBe(413);
  });
});

describe('control characters in text', () => {
  test('a job name with NUL is a 422 with the field message (it was a 500 from PostgreSQL)', async () => {
    const res = await jobsRoute.POST(
      await request('/api/jobs', { method: 'POST', body: { name: 'Pantry\u0000', notes: 'ok' }, user: fx.owner }),
      noParams,
    );
    expect(res.status).toBe(422);
    expect((await res.json()).fields.name).toEqual(['Remove the control character (an invisible character such as NUL) from this text.']);
  });

  test('a new person’s e-mail with spaces around it is trimmed, not refused', async () => {
    const email = uniqueEmail('spaced');
    const res = await teamRoute.POST(
      await request('/api/team', {
        method: 'POST',
        body: { name: 'Tomas Reyes', email: `  ${email.toUpperCase()} `, role: 'cutter', password: 'a-long-enough-password' },
        user: fx.owner,
      }),
      noParams,
    );
    expect(res.status).toBe(201);
    expect((await res.json()).email).toBe(email.toLowerCase());
  });

  // Every write route's valid body with NUL put into each of its strings in turn: never a server error. (Checks
  // that report row by row, a cut-list preview or a stock file check, answer 200 with the row's problem; a
  // password may hold any character.)
  const TABLE: AuthzRow[] = Object.values(import.meta.glob<{ rows?: AuthzRow[] }>('./authz/*.ts', { eager: true })).flatMap((m) => m.rows ?? []);
  const withNul = (value: unknown, at: number, counter = { n: 0 }): unknown => {
    if (typeof value === 'string') return counter.n++ === at ? `${value}\u0000` : value;
    if (Array.isArray(value)) return value.map((v) => withNul(v, at, counter));
    if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, withNul(v, at, counter)]));
    return value;
  };
  const countStrings = (value: unknown): number =>
    typeof value === 'string'
      ? 1
      : Array.isArray(value)
        ? value.reduce((n: number, v) => n + countStrings(v), 0)
        : value && typeof value === 'object'
          ? Object.values(value).reduce((n: number, v) => n + countStrings(v), 0)
          : 0;
  const cases = TABLE.filter((r) => r.method !== 'GET' && countStrings(r.body) > 0).flatMap((r) =>
    Array.from({ length: countStrings(r.body) }, (_, at) => ({ ...r, at })),
  );
  test.each(cases)('$method $route with NUL in string #$at → never 500', async ({ route, method, body, target, at }) => {
    const params = target ? await target({ ...fx, db: handle.db }) : {};
    const url = Object.entries(params).reduce((u, [k, v]) => u.replace(`[${k}]`, v), route);
    const mod = (await import(/* @vite-ignore */ path.resolve('app/api', route.slice('/api/'.length), 'route.ts'))) as Record<
      string,
      typeof jobsRoute.POST
    >;
    const payload = JSON.parse(JSON.stringify(withNul(body, at)).replace('EMAIL', uniqueEmail('nul')));
    const res = await mod[method](await request(url, { method, body: payload, user: fx.owner }), { params: Promise.resolve(params) } as never);
    expect(res.status, await res.clone().text()).toBeLessThan(500);
    if (res.status < 300 && !/preview|import|team/.test(route)) throw new Error(`${method} ${route} took NUL in string #${at}: ${await res.text()}`);
  });
});
