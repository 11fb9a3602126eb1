/**
 * The session token's decode, remembered per token (server/auth/token.ts): it answers what next-auth's own decode
 * answers, for as long as that would, and never for a token that does not decrypt.
 */
import { decode, encode } from 'next-auth/jwt';
import { afterEach, describe, expect, test, vi } from 'vitest';
import { decodeSessionToken } from './token';

const SECRET = 'token-test-secret-0123456789-abcdefghijklmnop';
const claims = { userId: '7d6a3c1e-5b2f-4c8d-9e0a-1b2c3d4e5f60', shopId: '0f1e2d3c-4b5a-4968-8776-655443322110', tokenVersion: 3 };

afterEach(() => vi.useRealTimers());

describe('decodeSessionToken', () => {
  test("gives next-auth's own payload, the first time and every time after", async () => {
    const token = await encode({ secret: SECRET, token: claims });
    const reference = await decode({ token, secret: SECRET });
    expect(reference).toMatchObject(claims);
    expect(await decodeSessionToken({ token, secret: SECRET })).toEqual(reference);
    expect(await decodeSessionToken({ token, secret: SECRET })).toEqual(reference);
  });

  test('a kept payload cannot be changed by a caller', async () => {
    const token = await encode({ secret: SECRET, token: claims });
    const first = await decodeSessionToken({ token, secret: SECRET });
    expect(() => {
      (first as Record<string, unknown>).tokenVersion = 99;
    }).toThrow();
    expect((await decodeSessionToken({ token, secret: SECRET }))?.tokenVersion).toBe(3);
  });

  test('a token past its expiry (and next-auth’s 15 s of tolerance) is refused even though it was kept', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date('2026-12-04T08:00:00Z'));
    const token = await encode({ secret: SECRET, token: claims, maxAge: 60 });
    expect(await decodeSessionToken({ token, secret: SECRET })).toMatchObject(claims);
    vi.setSystemTime(new Date('2026-12-04T08:01:10Z')); // 70 s: expired, within the tolerance
    expect(await decodeSessionToken({ token, secret: SECRET })).toMatchObject(claims);
    vi.setSystemTime(new Date('2026-12-04T08:01:20Z')); // 80 s: past it
    await expect(decode({ token, secret: SECRET })).rejects.toThrow();
    await expect(decodeSessionToken({ token, secret: SECRET })).rejects.toThrow();
  });

  test('a token kept under one secret is not accepted under another, and a tampered token is never kept', async () => {
    const token = await encode({ secret: SECRET, token: claims });
    expect(await decodeSessionToken({ token, secret: SECRET })).toMatchObject(claims);
    await expect(decodeSessionToken({ token, secret: `${SECRET}-rotated` })).rejects.toThrow();
    const tampered = `${token.slice(0, -4)}${token.slice(-4) === 'AAAA' ? 'BBBB' : 'AAAA'}`;
    await expect(decodeSessionToken({ token: tampered, secret: SECRET })).rejects.toThrow();
    await expect(decodeSessionToken({ token: tampered, secret: SECRET })).rejects.toThrow();
  });

  test('no token, no session', async () => {
    expect(await decodeSessionToken({ token: undefined, secret: SECRET })).toBeNull();
  });
});
