/**
 * The public routes behind the shop's rate limiter (issue "The web edge" §2): link guessing is stopped by client
 * address, reset requests by e-mail address, each with 429 and Retry-After; a good link is never counted.
 */
import type { NextRequest } from 'next/server';
import { describe, expect, test } from 'vitest';
import * as inviteRoute from '@/app/api/invites/[token]/route';
import * as resetsRoute from '@/app/api/password-resets/route';
import * as resetRoute from '@/app/api/password-resets/[token]/route';
import { LIMITS } from '@/server/api/limit';
import { setUpTwoShopDatabase } from '../support/two-shop-database';
import { request } from '../support/fixtures';
import { uniqueEmail } from '../support/unique';

setUpTwoShopDatabase(() => {});

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;
const post = async (handler: Handler, params: Record<string, string>, body: unknown, address: string) =>
  handler(await request('/api/x', { method: 'POST', body, headers: { 'x-forwarded-for': address } }), { params: Promise.resolve(params) });
/** A well-formed token that no link has (43 base64url characters). */
const guess = (i: number) => `${'g'.repeat(40)}${String(i).padStart(3, '0')}`;

describe('links that do not work, tried from one address', () => {
  test(`${LIMITS['invite-accept'].points} wrong tries are answered 404; the next is 429 with Retry-After, on the invite and the reset links alike`, async () => {
    const address = '203.0.113.7';
    for (let i = 0; i < LIMITS['invite-accept'].points; i++) {
      const handler = i % 2 ? resetRoute.POST : inviteRoute.POST;
      expect((await post(handler, { token: guess(i) }, { password: 'long-enough-password' }, address)).status).toBe(404);
    }
    const refused = await post(inviteRoute.POST, { token: guess(99) }, { password: 'long-enough-password' }, address);
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    expect((await refused.json()).error).toMatch(/^Too many tries with links that do not work\. Try again in \d+ minutes?\.$/);
    // Another address is not held back.
    expect((await post(inviteRoute.POST, { token: guess(100) }, { password: 'long-enough-password' }, '198.51.100.4')).status).toBe(404);
  });
});

describe('reset links asked for one e-mail address', () => {
  test(`${LIMITS['password-reset'].points} requests an hour get the usual answer, the next 429, whether or not the address has an account`, async () => {
    for (const email of [uniqueEmail('nobody'), 'cut@birchwood.example']) {
      for (let i = 0; i < LIMITS['password-reset'].points; i++) {
        expect((await post(resetsRoute.POST, {}, { email }, `192.0.2.${i}`)).status).toBe(202);
      }
      const refused = await post(resetsRoute.POST, {}, { email: email.toUpperCase() }, '192.0.2.200');
      expect(refused.status).toBe(429);
      expect(refused.headers.get('retry-after')).toMatch(/^\d+$/);
    }
  });
});
