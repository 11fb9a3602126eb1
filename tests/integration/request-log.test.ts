/** One structured log line per API request, with who and what, and never a password, a token or a cookie. */
import { Writable } from 'node:stream';
import { describe, expect, test } from 'vitest';
import * as teamRoute from '@/app/api/team/route';
import * as jobsRoute from '@/app/api/jobs/route';
import { logTo } from '@/lib/log';
import { useTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request, sessionCookie } from '../support/fixtures';
import { uniqueEmail } from '../support/unique';

let fx: TwoShops;
useTwoShopDatabase((app) => ({ fx } = app));
const noParams = { params: Promise.resolve({}) };

function captureLog(): string[] {
  const lines: string[] = [];
  logTo(
    new Writable({
      write(chunk, _enc, done) {
        lines.push(...String(chunk).split('\n').filter(Boolean));
        done();
      },
    }),
  );
  return lines;
}

describe('request log', () => {
  test('a new person added: one JSON line with method, route, status, ms, shop, user and request id; no password, no cookie', async () => {
    const lines = captureLog();
    const password = 'a-secret-nobody-logs-42';
    const req = await request('/api/team', {
      method: 'POST',
      body: { name: 'Tomas Reyes', email: uniqueEmail('log'), role: 'cutter', password },
      user: fx.owner,
    });
    const res = await teamRoute.POST(req, noParams);
    expect(res.status).toBe(201);
    expect(lines).toHaveLength(1);
    const line = JSON.parse(lines[0]);
    expect(line).toMatchObject({
      msg: 'api request',
      method: 'POST',
      route: '/api/team',
      status: 201,
      shopId: fx.owner.shopId,
      userId: fx.owner.id,
      requestId: res.headers.get('x-request-id'),
    });
    expect(typeof line.ms).toBe('number');
    const cookie = await sessionCookie(fx.owner);
    expect(lines[0]).not.toContain(password);
    expect(lines[0]).not.toContain(cookie.split('=')[1].slice(0, 40));
  });

  test('ids in the path are grouped as :id; a refused request has no user, and a proxy’s request id is kept', async () => {
    const lines = captureLog();
    const res = await jobsRoute.GET(await request('/api/jobs', { headers: { 'x-request-id': 'edge-proxy-0001' } }), noParams);
    expect(res.status).toBe(401);
    expect(JSON.parse(lines[0])).toMatchObject({ route: '/api/jobs', status: 401, userId: null, shopId: null, requestId: 'edge-proxy-0001' });
    const { routeOf } = await import('@/lib/log');
    expect(routeOf('/api/jobs/3f1c2a9e-8d7b-4c6a-9e5f-1a2b3c4d5e6f/parts/0a1b2c3d-4e5f-4a6b-8c7d-9e0f1a2b3c4d')).toBe('/api/jobs/:id/parts/:id');
  });

  test('anything that tries to log a password, a token or a cookie is redacted', async () => {
    const lines = captureLog();
    const { log } = await import('@/lib/log');
    log().info({ user: { password: 'hunter2-hunter2', token: 'tok-123' }, headers: { cookie: 'next-auth.session-token=abc' } }, 'careless');
    expect(lines[0]).not.toMatch(/hunter2|tok-123|session-token/);
    expect(lines[0]).toContain('[redacted]');
  });
});
