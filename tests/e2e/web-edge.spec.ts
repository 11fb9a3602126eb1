/**
 * The web edge replayed from outside against the running server (`next start`, started by global setup): the same
 * requests as in issue 11, made with a real session cookie over real HTTP.
 */
import http from 'node:http';
import { zipSync } from 'fflate';
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

    const promote = await page.request.patch(`/api/team/${cutter.id}`, {
      headers: { ...EVIL, 'content-type': 'text/plain' },
      data: JSON.stringify({ role: 'owner' }),
    });
    expect(promote.status()).toBe(403);
    const promoteJson = await page.request.patch(`/api/team/${cutter.id}`, { headers: EVIL, data: { role: 'owner' } });
    expect(promoteJson.status()).toBe(403);
    expect((await teamMember(page.request, person('cutter').email)).role).toBe('cutter');

    const email = `mallory.${Date.now()}@evil.example`;
    const made = await page.request.post('/api/team', {
      headers: EVIL,
      data: { name: 'Mallory', email, role: 'owner', password: 'a-long-enough-password' },
    });
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
        {
          host: '127.0.0.1',
          port: E2E_PORT,
          path: '/api/offcuts',
          method: 'POST',
          headers: { cookie, origin: E2E_URL, 'content-type': 'application/json', 'transfer-encoding': 'chunked' },
        },
        (res) => {
          answered = true;
          resolve(res.statusCode ?? 0);
          res.resume();
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

test.describe('sign-in throttle', () => {
  /** Posts the credentials as next-auth's client does, from a client address of the test's own. */
  async function attempt(request: APIRequestContext, email: string, password: string, address: string) {
    const { csrfToken } = await (await request.get('/api/auth/csrf')).json();
    return request.post('/api/auth/callback/credentials', {
      form: { email, password, csrfToken, json: 'true' },
      headers: { 'x-forwarded-for': address },
    });
  }

  test('ten wrong passwords, then the right one is refused (429, Retry-After), the same for an unknown e-mail; the form says so', async ({
    page,
    browser,
    consoleErrors,
  }) => {
    test.setTimeout(120_000);
    await signIn(page, 'owner');
    const email = `throttled.${Date.now()}@larkspur.example`;
    const password = 'a-long-enough-password';
    expect((await page.request.post('/api/team', { data: { name: 'Tomas Reyes', email, role: 'estimator', password } })).status()).toBe(201);

    const guest = await browser.newContext({ baseURL: E2E_URL, extraHTTPHeaders: { origin: E2E_URL } });
    const answers = async (who: string, address: string) => {
      const out: string[] = [];
      for (let i = 0; i < 10; i++) out.push(String((await attempt(guest.request, who, `wrong-${i}`, address)).status()));
      const last = await attempt(guest.request, who, password, address);
      out.push(`${last.status()} ${(await last.json()).error} ${last.headers()['retry-after'] ? 'Retry-After' : ''}`);
      return { out, retryAfter: Number(last.headers()['retry-after']) };
    };
    const known = await answers(email, '203.0.113.10');
    const unknown = await answers(`nobody.${Date.now()}@larkspur.example`, '203.0.113.11');
    expect(known.out.slice(0, 10)).toEqual(Array(10).fill('401'));
    expect(known.out[10]).toBe('429 Too many sign-in attempts. Try again in 15 minutes. Retry-After');
    expect(known.retryAfter).toBeGreaterThan(800);
    expect(unknown.out).toEqual(known.out);

    // The sign-in form tells the person to wait (the browser logs the refused request).
    consoleErrors.allow(/status of 429/);
    const form = await guest.newPage();
    await form.goto('/sign-in');
    await form.getByLabel('E-mail').fill(email);
    await form.getByLabel('Password').fill(password);
    await form.getByRole('button', { name: 'Sign in' }).click();
    await expect(form.getByRole('alert').filter({ hasText: /\S/ })).toHaveText('Too many sign-in attempts. Try again in 15 minutes.');
    await guest.close();
  });
});

test.describe('sign-out', () => {
  test('revokes the session: a saved copy of the cookie is refused after signing out', async ({ page, browser }) => {
    await signIn(page, 'estimator');
    const saved = await page.context().cookies();
    expect((await page.request.get('/api/jobs')).status()).toBe(200);
    await page.getByRole('button', { name: 'Sign out' }).first().click();
    await expect(page).toHaveURL(/\/sign-in/);

    const replay = await browser.newContext({ baseURL: E2E_URL, extraHTTPHeaders: { origin: E2E_URL } });
    await replay.addCookies(saved);
    expect((await replay.request.get('/api/jobs')).status()).toBe(401);
    const again = await replay.newPage();
    await again.goto('/jobs');
    await expect(again).toHaveURL(/\/sign-in/);
    await replay.close();
  });
});

test.describe('security headers', () => {
  test('every page has its own CSP nonce on its scripts, no framing, nosniff; API answers carry the headers too', async ({ page }) => {
    const first = await page.goto('/sign-in');
    const csp = first!.headers()['content-security-policy'];
    const nonce = /'nonce-([^']+)'/.exec(csp)?.[1];
    expect(nonce).toBeTruthy();
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("worker-src 'self' blob:");
    expect(first!.headers()['x-content-type-options']).toBe('nosniff');
    expect(first!.headers()['referrer-policy']).toBe('strict-origin-when-cross-origin');
    expect(first!.headers()['permissions-policy']).toMatch(/camera=\(\)/);
    // Plain http here, so no HSTS.
    expect(first!.headers()['strict-transport-security']).toBeUndefined();
    const scripts = await page.locator('script').evaluateAll((els) => els.map((e) => (e as HTMLScriptElement).nonce));
    expect(scripts.length).toBeGreaterThan(0);
    expect(new Set(scripts)).toEqual(new Set([nonce]));

    const second = await page.goto('/sign-in');
    expect(/'nonce-([^']+)'/.exec(second!.headers()['content-security-policy'])?.[1]).not.toBe(nonce);

    const api = await page.request.get('/api/jobs');
    expect(api.status()).toBe(401);
    expect(api.headers()['x-content-type-options']).toBe('nosniff');
    expect(api.headers()['x-frame-options']).toBe('DENY');
    // Over https (as a proxy in front reports it), pages and API answers add HSTS.
    const overTls = await page.request.get('/api/health', { headers: { 'x-forwarded-proto': 'https' } });
    expect(overTls.headers()['strict-transport-security']).toMatch(/max-age=\d+/);
  });
});

test.describe('big inputs off the event loop', () => {
  test('/api/health keeps answering while a 1 MB stock file is checked', async ({ page }) => {
    test.setTimeout(120_000);
    await signIn(page, 'owner');
    const header = 'Kind,Material,Thickness,Length,Width,Quantity,Cost,Supplier,Location\n';
    const row = (i: number) => `sheet,Edge test ply ${i},18 mm,2440 mm,1220 mm,${i % 40},46.50,Cedar Run Plywood,Rack ${i % 9}\n`;
    let csv = header;
    for (let i = 0; csv.length < 990_000; i++) csv += row(i);
    csv = csv.slice(0, csv.lastIndexOf('\n', 990_000) + 1);

    let importing = true;
    const waits: number[] = [];
    const poll = (async () => {
      while (importing) {
        const t0 = performance.now();
        await fetch(`${E2E_URL}/api/health`);
        waits.push(performance.now() - t0);
        await new Promise((r) => setTimeout(r, 25));
      }
    })();
    const t0 = performance.now();
    const res = await page.request.post('/api/stock/import', { data: { csv, commit: 'none' }, timeout: 110_000 });
    const importMs = performance.now() - t0;
    importing = false;
    await poll;

    expect(res.status()).toBe(200);
    const body = await res.json();
    expect(body.valid).toBeGreaterThan(10_000);
    expect(body.imported).toBe(0);
    const worst = Math.max(...waits);
    console.log(
      `stock check of ${csv.length} bytes took ${Math.round(importMs)} ms; /api/health answered ${waits.length} times, worst ${Math.round(worst)} ms`,
    );
    expect(waits.length).toBeGreaterThan(3);
    // The target is 100 ms; the margin is for a shared, busy test machine (before: 4.6 s behind one check).
    expect(worst).toBeLessThan(1_000);
  });
});

test.describe('a workbook that unpacks to far too much', () => {
  test('is stopped in the browser with a message, and the page stays responsive', async ({ page }) => {
    test.setTimeout(90_000);
    // 100 MB of spaces in a zip of ~100 kB, under the 512 kB upload limit (built with fflate's zip writer).
    const piece = new Uint8Array(4 * 1024 * 1024).fill(0x20);
    const entries: Record<string, Uint8Array> = {};
    for (let i = 0; i < 25; i++) entries[`xl/media/filler${i}.bin`] = piece;
    const bomb = Buffer.from(zipSync(entries, { level: 9 }));
    expect(bomb.length).toBeLessThan(512 * 1024);

    await signIn(page, 'estimator');
    await page.goto('/jobs?q=Pemberton%20vanity');
    await page.getByRole('link', { name: 'Pemberton vanity' }).click();
    await page.getByRole('button', { name: 'Upload CSV or Excel' }).click();
    await page
      .getByLabel('File')
      .setInputFiles({ name: 'huge.xlsx', mimeType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', buffer: bomb });
    // While the worker reads, the page still answers.
    expect(await page.evaluate(() => 6 * 7)).toBe(42);
    await expect(page.getByText(/unpacks to more than 40 MB/)).toBeVisible({ timeout: 30_000 });
  });
});
