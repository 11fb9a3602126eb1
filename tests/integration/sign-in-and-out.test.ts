/**
 * Sign-in throttled by account and by address: the throttle around our credentials check (next-auth's authorize,
 * on the test database), answered as next-auth's callback answers. next-auth's route handler itself needs a
 * running Next.js (it reads cookies from the request scope): tests/e2e/web-edge.spec.ts replays these requests
 * against `next start`.
 */
import { createHash, randomBytes } from 'node:crypto';
import bcrypt from 'bcryptjs';
import { describe, expect, test, vi } from 'vitest';
import { NextRequest } from 'next/server';
import type { DbHandle } from '@/db/open';
import { BCRYPT_ROUNDS } from '@/db/queries/team';
import { authOptions, DUMMY_HASH } from '@/lib/auth/options';
import { throttledSignIn } from '@/lib/auth/sign-in-throttle';
import { createLimiters, forgive, limit, LIMITS, spend } from '@/lib/api/limit';
import { useTwoShopDatabase } from '../support/two-shop-database';
import { TEST_PASSWORD, TEST_SECRET } from '../support/fixtures';

let handle: DbHandle;
useTwoShopDatabase((app) => ({ handle } = app));

const OWNER = 'owner@birchwood.example';

/** next-auth's credentials callback as it answers with `json=true`: 200 and the page, or 401 and the error. */
async function nextAuthCallback(req: Request): Promise<Response> {
  const provider = authOptions().providers[0] as unknown as { options: { authorize: (c: Record<string, unknown>, r: unknown) => Promise<unknown> } };
  const form = await req.formData();
  const user = await provider.options.authorize({ email: form.get('email'), password: form.get('password') }, {});
  return user
    ? Response.json({ url: 'http://localhost/' })
    : Response.json({ url: 'http://localhost/api/auth/error?error=CredentialsSignin&provider=credentials' }, { status: 401 });
}
let addressCounter = 0;
/** A documentation-range address (RFC 5737) of its own for each test, so the by-address count starts at zero. */
const freshAddress = () => `198.51.100.${++addressCounter}`;

function signIn(email: string, password: string, address: string) {
  // next-auth's double-submit CSRF token: the cookie holds `token|sha256(token + secret)`.
  const token = randomBytes(16).toString('hex');
  const hash = createHash('sha256').update(`${token}${TEST_SECRET}`).digest('hex');
  const req = new NextRequest('http://localhost/api/auth/callback/credentials', {
    method: 'POST',
    headers: {
      'content-type': 'application/x-www-form-urlencoded',
      cookie: `next-auth.csrf-token=${token}%7C${hash}`,
      'x-forwarded-for': address,
      origin: 'http://localhost',
      host: 'localhost',
    },
    body: new URLSearchParams({ email, password, csrfToken: token, json: 'true', callbackUrl: 'http://localhost/' }).toString(),
  });
  return throttledSignIn(req, nextAuthCallback);
}

process.env.NEXTAUTH_URL = 'http://localhost';

describe('sign-in throttle', () => {
  test(`${LIMITS['sign-in:account'].points} wrong passwords, then the right one is refused with 429 and Retry-After`, async () => {
    const address = freshAddress();
    expect((await signIn(OWNER, TEST_PASSWORD, address)).status).toBe(200);
    for (let i = 0; i < LIMITS['sign-in:account'].points; i++) expect((await signIn(OWNER, `wrong-${i}`, address)).status).toBe(401);
    const refused = await signIn(OWNER, TEST_PASSWORD, address);
    expect(refused.status).toBe(429);
    const retryAfter = Number(refused.headers.get('retry-after'));
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(LIMITS['sign-in:account'].seconds);
    expect((await refused.json()).error).toBe('Too many sign-in attempts. Try again in 15 minutes.');
    // The e-mail in another case or with spaces is the same account.
    expect((await signIn('  OWNER@Birchwood.example ', TEST_PASSWORD, freshAddress())).status).toBe(429);
    // Another account is not affected.
    expect((await signIn('est@birchwood.example', TEST_PASSWORD, address)).status).toBe(200);
    await forgive('sign-in:account', OWNER);
  }, 60_000);

  test('an unknown e-mail gets exactly the same answers as a known one, and the same hash work', async () => {
    const known = 'cut@birchwood.example';
    const unknown = 'nobody@birchwood.example';
    const answers = async (email: string) => {
      const address = freshAddress();
      const out: string[] = [];
      for (let i = 0; i <= LIMITS['sign-in:account'].points; i++) {
        const res = await signIn(email, 'not-the-password', address);
        const body = (await res.json()) as { url?: string; error?: string };
        out.push(
          `${res.status} ${body.error ?? ''} ${body.url?.replace(/TooManyAttempts%3A\d+/, 'TooManyAttempts:N') ?? ''} ${res.headers.has('retry-after')}`,
        );
      }
      return out;
    };
    const forKnown = await answers(known);
    const forUnknown = await answers(unknown);
    expect(forUnknown).toEqual(forKnown);
    expect(forKnown.at(-1)).toMatch(/^429 Too many sign-in attempts/);
    expect(forKnown[0]).toMatch(/^401 .*error=CredentialsSignin/);

    // One compare per attempt, against a hash as costly as a real one (the dummy has the same rounds).
    const compare = vi.spyOn(bcrypt, 'compare');
    await signIn('stranger@elsewhere.example', 'whatever', freshAddress());
    expect(compare).toHaveBeenCalledTimes(1);
    expect(compare.mock.calls[0][1]).toBe(DUMMY_HASH);
    expect(bcrypt.getRounds(DUMMY_HASH)).toBe(BCRYPT_ROUNDS);
    compare.mockRestore();
    await forgive('sign-in:account', known);
    await forgive('sign-in:account', unknown);
  }, 60_000);

  test('a right password clears its account’s wrong ones', async () => {
    const address = freshAddress();
    const email = 'est@birchwood.example';
    for (let i = 0; i < LIMITS['sign-in:account'].points - 1; i++) expect((await signIn(email, 'wrong', address)).status).toBe(401);
    expect((await signIn(email, TEST_PASSWORD, address)).status).toBe(200);
    for (let i = 0; i < LIMITS['sign-in:account'].points - 1; i++) expect((await signIn(email, 'wrong', address)).status).toBe(401);
    expect((await signIn(email, TEST_PASSWORD, address)).status).toBe(200);
  }, 60_000);

  test('one address that runs through its wrong attempts across many e-mails is refused even with a right password', async () => {
    const address = freshAddress();
    const rule = LIMITS['sign-in:address'];
    // Count the address's attempts up to one short of its limit directly, then make the last one through sign-in.
    for (let i = 0; i < rule.points - 1; i++) await spend('sign-in:address', address);
    expect((await signIn(`guess-${Date.now()}@nowhere.example`, 'guess', address)).status).toBe(401);
    const refused = await signIn(OWNER, TEST_PASSWORD, address);
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    expect((await signIn(OWNER, TEST_PASSWORD, freshAddress())).status).toBe(200);
  }, 60_000);
});

describe('the limiter store', () => {
  test('with PostgreSQL, two app servers (two limiter sets on the database) count the same attempts; in memory, each process counts its own', async () => {
    const key = `shared-${Date.now()}`;
    if (handle.url) {
      const { Pool } = await import('pg');
      const poolA = new Pool({ connectionString: handle.url, max: 1 });
      const poolB = new Pool({ connectionString: handle.url, max: 1 });
      const a = createLimiters({ pool: poolA });
      const b = createLimiters({ pool: poolB });
      for (let i = 0; i < 4; i++) await spend('password-reset', key, a);
      expect(await limit('password-reset', key, b)).toMatchObject({ blocked: false, remaining: 1 });
      await spend('password-reset', key, b);
      expect((await limit('password-reset', key, a)).blocked).toBe(true);
      await poolA.end();
      await poolB.end();
    } else {
      const a = createLimiters({ pool: null });
      const b = createLimiters({ pool: null });
      for (let i = 0; i < LIMITS['password-reset'].points; i++) await spend('password-reset', key, a);
      expect((await limit('password-reset', key, a)).blocked).toBe(true);
      expect((await limit('password-reset', key, b)).blocked).toBe(false);
    }
  });
});

describe('sign-out', () => {
  test('revokes the session: the same cookie replayed after sign-out is a 401, and a new sign-in works', async () => {
    const { request } = await import('../support/fixtures');
    const jobsRoute = await import('@/app/api/jobs/route');
    const { users } = await import('@/db/schema');
    const { eq } = await import('drizzle-orm');
    const [row] = await handle.db.select().from(users).where(eq(users.email, 'est@birchwood.example'));
    const session = { id: row.id, shopId: row.shopId, role: row.role, tokenVersion: row.tokenVersion };
    const noParams = { params: Promise.resolve({}) };
    expect((await jobsRoute.GET(await request('/api/jobs', { user: session }), noParams)).status).toBe(200);

    await authOptions().events!.signOut!({
      token: { userId: row.id, shopId: row.shopId, role: row.role, tokenVersion: row.tokenVersion },
      session: undefined as never,
    });

    expect((await jobsRoute.GET(await request('/api/jobs', { user: session }), noParams)).status).toBe(401);
    const [after] = await handle.db.select().from(users).where(eq(users.id, row.id));
    expect(after.tokenVersion).toBe(row.tokenVersion + 1);
    expect((await jobsRoute.GET(await request('/api/jobs', { user: { ...session, tokenVersion: after.tokenVersion } }), noParams)).status).toBe(200);
  });
});
