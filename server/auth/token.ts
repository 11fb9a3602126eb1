import { decode, type JWT, type JWTDecodeParams } from 'next-auth/jwt';

/**
 * next-auth's session-token decode, remembered per token: the same cookie comes with every request of a signed-in
 * person, and decrypting it (a key derived from the secret, then AES-GCM) was a tenth of an API request's work. What
 * is remembered is only what the token itself says, a pure function of the token and the secret, so it is the same
 * on every app server and nothing in it can go stale but time: each reuse checks the expiry again, with next-auth's
 * 15 s of tolerance. Whether the session still counts (signed out, role changed, deactivated) is not the token's to
 * say: every request still asks the database (db/queries/users.ts `loadSessionUser`). Tokens that do not decode are
 * never kept. Shared by the proxy, route handlers and pages of one process; at most 1000 tokens, then it starts afresh.
 */
const LIMIT = 1000;
const CLOCK_TOLERANCE_S = 15;

interface Kept {
  secret: string | Buffer;
  payload: JWT;
  exp: number | undefined;
}

const holder = globalThis as typeof globalThis & { __kerfwiseTokens?: Map<string, Kept> };

export async function decodeSessionToken(params: JWTDecodeParams): Promise<JWT | null> {
  const { token, secret, salt = '' } = params;
  if (!token) return null;
  const tokens = (holder.__kerfwiseTokens ??= new Map());
  const key = `${salt}\n${token}`;
  const kept = tokens.get(key);
  if (kept && kept.secret === secret) {
    if (kept.exp === undefined || Date.now() / 1000 < kept.exp + CLOCK_TOLERANCE_S) return kept.payload;
    tokens.delete(key);
  }
  // Throws on a token that does not decrypt or has expired, as next-auth's own decode does (getToken answers null).
  const payload = await decode(params);
  if (!payload) return null;
  Object.freeze(payload);
  if (tokens.size >= LIMIT) tokens.clear();
  tokens.set(key, { secret, payload, exp: typeof payload.exp === 'number' ? payload.exp : undefined });
  return payload;
}
