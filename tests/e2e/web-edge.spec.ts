/**
 * The web edge replayed from outside against the running server (`next start`, started by global setup): the same
 * requests as in issue 11, made with a real session cookie over real HTTP.
 */
import http from 'node:http';
import type { APIRequestContext, Page } from '@playwright/test';
import { E2E_PORT, E2E_URL, serverRssBytes } from './support/server';
import { person, signIn } from './support/session';
import { expect, test } from './support/test';

const EVIL = { origin: 'http://evil.example', 'sec-fetch-site': 'cross-site' };

async function cookieHeader(page: Page): Promise<string> {
  return (await page.context().cookies()).map((c) => `${c.name}=${c.value}`).join('; ');
}

async function teamMember(request: APIRequestContext, email: string): Promise<{ id: string; role: string }> {
  const team: { id: string; email: string; role: string }[] = await (await request.get('/api/team')).json();
  return team.find((m) => m.email === email)!;
}

test.describe('requests from another site', () => {
  test("the owner's cookie sent from evil.example cannot promote the cutter, make an owner or delete a job", async ({ page }) => {
    await signIn(page, 'owner');
    const cutter = await teamMember(page.request, person('cutter').email);

    const promote = await page.request.patch(`/api/team/${cutter.id}`, { headers: { ...EVIL, 'content-type': 'text/plain' }, data: JSON.stringify({ role: 'owner' }) });
    expect(promote.status()).toBe(403);
    const promoteJson = await page.request.patch(`/api/team/${cutter.id}`, { headers: EVIL, data: { role: 'owner' } });
    expect(promoteJson.status()).toBe(403);
    expect((await teamMember(page.request, person('cutter').email)).role).toBe('cutter');

    const email = `mallory.${Date.now()}@evil.example`;
    const made = await page.request.post('/api/team', { headers: EVIL, data: { name: 'Mallory', email, role: 'owner', password: 'a-long-enough-password' } });
    expect(made.status()).toBe(403);
    const plain = await page.request.post('/api/team', {
      headers: { 'content-type': 'text/plain' },
      data: JSON.stringify({ name: 'Mallory', email, role: 'owner', password: 'a-long-enough-password' }),
    });
    expect(plain.status()).toBe(415);
    expect(await teamMember(page.request, email)).toBeUndefined();

    const job = await (await page.request.post('/api/jobs', { data: { name: `Edge check ${Date.now()}` } })).json();
    expect((await page.request.delete(`/api/jobs/${job.id}`, { headers: EVIL })).status()).toBe(403);
    expect((await page.request.get(`/api/jobs/${job.id}`)).status()).toBe(200);
    expect((await page.request.delete(`/api/jobs/${job.id}`)).status()).toBe(200);
  });
});

test.describe('a huge chunked body', () => {
  test('300 MB sent chunked by the cutter gets a 413 and the server memory stays flat', async ({ page }) => {
    test.setTimeout(120_000);
    await signIn(page, 'cutter');
    const cookie = await cookieHeader(page);
    const before = serverRssBytes();
    let peak = before;
    const sampler = setInterval(() => (peak = Math.max(peak, serverRssBytes())), 50);

    const chunk = Buffer.alloc(256 * 1024, 'x');
    const total = 300 * 1024 * 1024;
    const status = await new Promise<number>((resolve, reject) => {
      let sent = 0;
      let answered = false;
      const req = http.request(
        { host: '127.0.0.1', port: E2E_PORT, path: '/api/offcuts', method: 'POST', headers: { cookie, origin: E2E_URL, 'content-type': 'application/json', 'transfer-encoding': 'chunked' } },
        (res) => {
          answered = true;
          res.resume();
          res.on('end', () => resolve(res.statusCode ?? 0));
          req.destroy();
        },
      );
      req.on('error', (e) => (answered ? undefined : reject(e)));
      const pump = () => {
        while (!answered && sent < total) {
          sent += chunk.length;
          if (!req.write(chunk)) return void req.once('drain', pump);
        }
        if (!answered) req.end();
      };
      pump();
    });
    clearInterval(sampler);
    peak = Math.max(peak, serverRssBytes());

    expect(status).toBe(413);
    // Reading 300 MB whole took the server up by more than its size; counting as it streams keeps it to noise.
    expect(peak - before, `RSS ${Math.round(before / 1e6)} MB → peak ${Math.round(peak / 1e6)} MB`).toBeLessThan(80 * 1024 * 1024);
    console.log(`server RSS before ${Math.round(before / 1e6)} MB, peak during the 300 MB body ${Math.round(peak / 1e6)} MB`);
    expect((await page.request.get('/api/health')).status()).toBe(200);
  });
});
