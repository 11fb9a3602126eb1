import 'server-only';
import type { NextRequest } from 'next/server';
import { HttpError } from './errors';
import { clientAddress, limit, spend, tooManyAttempts } from './limit';

/** The public routes that may be hammered from outside: asking for a reset link, and using a link's token. */
export type ThrottledAction = 'password-reset-request' | 'link-use' | 'quote-page';

/**
 * Where the public (signed-out) routes meet the shop's rate limiter (lib/api/limit.ts; counts shared by every app
 * server on PostgreSQL). Each such route calls this first:
 * - a reset link may be asked for an address 5 times an hour (every request counts; the answer is the same whether
 *   the address has an account or not, so the limit does not tell either);
 * - a client address may try links that do not work (unknown, used, expired) 10 times in 15 minutes: a person with a
 *   good link never meets the limit, a guesser does (`countingFailedLinks` counts the failures);
 * - the customer's quote page and its actions: those failures too, and at most 300 requests a minute from one
 *   address however good the link.
 */
export async function throttlePublicRequest(req: Pick<NextRequest, 'headers'>, action: ThrottledAction, key?: string): Promise<void> {
  if (action === 'password-reset-request') {
    const email = `email:${(key ?? '').trim().toLowerCase()}`;
    const state = await limit('password-reset', email);
    if (state.blocked) throw tooManyAttempts(state, 'reset requests for this address');
    await spend('password-reset', email);
    return;
  }
  if (action === 'quote-page') {
    const busy = await spend('quote-page', `address:${clientAddress(req.headers)}`);
    if (busy.blocked) throw tooManyAttempts(busy, 'requests for quote pages');
  }
  const state = await limit('invite-accept', `address:${clientAddress(req.headers)}`);
  if (state.blocked) throw tooManyAttempts(state, 'tries with links that do not work');
}

/** Runs a link's use, counting it against the client's address when the link does not work (404 or 410). */
export async function countingFailedLinks<T>(req: Pick<NextRequest, 'headers'>, use: () => Promise<T>): Promise<T> {
  try {
    return await use();
  } catch (error) {
    if (error instanceof HttpError && (error.status === 404 || error.status === 410))
      await spend('invite-accept', `address:${clientAddress(req.headers)}`);
    throw error;
  }
}
