import 'server-only';
import { clientAddress, forgive, limit, spend, tooManyAttempts, type LimitState } from '@/lib/api/limit';

/** The account key of a sign-in: the e-mail as the user list compares it (trimmed, lower-case). */
export function accountKey(email: unknown): string {
  return typeof email === 'string' ? email.trim().toLowerCase().slice(0, 320) : '';
}

async function emailOf(req: Request): Promise<string> {
  try {
    const type = req.headers.get('content-type') ?? '';
    if (type.includes('application/json')) return accountKey(((await req.clone().json()) as { email?: unknown }).email);
    return accountKey((await req.clone().formData()).get('email'));
  } catch {
    return '';
  }
}

function refused(req: Request, state: LimitState): Response {
  const error = tooManyAttempts(state, 'sign-in attempts');
  // next-auth's client hands the form only the `error` of the answer's `url`: it carries the wait in seconds.
  const url = new URL('/sign-in', req.url);
  url.searchParams.set('error', `TooManyAttempts:${state.retryAfterSeconds}`);
  return Response.json({ error: error.message, url: url.toString() }, { status: 429, headers: error.headers });
}

/**
 * Sign-in with a throttle around it: refused (429, Retry-After) while the e-mail address or the client address has
 * used up its wrong attempts, known account or not, before any password is compared; a wrong attempt counts for
 * both, a right one clears the account's count. The answer and the work done are the same for an unknown e-mail
 * as for a known one (lib/auth/options.ts compares against a dummy hash).
 */
export async function throttledSignIn(req: Request, signIn: (req: Request) => Promise<Response>): Promise<Response> {
  const account = await emailOf(req);
  const address = clientAddress(req.headers);
  const [byAccount, byAddress] = await Promise.all([limit('sign-in:account', account), limit('sign-in:address', address)]);
  const blocked = [byAccount, byAddress].filter((s) => s.blocked).sort((a, b) => b.retryAfterSeconds - a.retryAfterSeconds)[0];
  if (blocked) return refused(req, blocked);

  const res = await signIn(req);
  if (await failed(res)) {
    // The attempt that uses up the limit is still answered as a wrong password; the next one is refused.
    await Promise.all([spend('sign-in:account', account), spend('sign-in:address', address)]);
  } else {
    await forgive('sign-in:account', account);
  }
  return res;
}

async function failed(res: Response): Promise<boolean> {
  if (res.status >= 400) return true;
  const location = res.headers.get('location');
  if (location) return /[?&]error=/.test(location);
  if ((res.headers.get('content-type') ?? '').includes('application/json')) {
    const body = (await res
      .clone()
      .json()
      .catch(() => ({}))) as { url?: string };
    return typeof body.url === 'string' && /[?&]error=/.test(body.url);
  }
  return false;
}
