import { withAuth, type NextRequestWithAuth } from 'next-auth/middleware';
import { NextResponse, type NextFetchEvent, type NextRequest } from 'next/server';
import { contentSecurityPolicy, isHttps, newNonce, securityHeaders } from '@/lib/security-headers';
import { decodeSessionToken } from '@/server/auth/token';

/**
 * Every page gets a Content-Security-Policy with a nonce of its own (Next.js's documented proxy pattern: the nonce
 * goes on the request's CSP header, where Next.js reads it for its scripts, and on the answer) and the other
 * security headers. Signed-out visitors are redirected to the sign-in page; every page, route handler and action
 * still checks the session and the role itself.
 */
function withHeaders(req: NextRequest): NextResponse {
  const nonce = newNonce();
  const csp = contentSecurityPolicy(nonce, { development: process.env.NODE_ENV === 'development' });
  const requestHeaders = new Headers(req.headers);
  requestHeaders.set('x-nonce', nonce);
  requestHeaders.set('Content-Security-Policy', csp);
  const res = NextResponse.next({ request: { headers: requestHeaders } });
  res.headers.set('Content-Security-Policy', csp);
  for (const [k, v] of Object.entries(securityHeaders(isHttps(req)))) res.headers.set(k, v);
  return res;
}

const signedIn = withAuth((req: NextRequestWithAuth) => withHeaders(req), { pages: { signIn: '/sign-in' }, jwt: { decode: decodeSessionToken } });

// The sign-in page, the pages single-use links open (invite, password reset) and a customer's quote page (/q/<token>)
// are for the signed-out.
const PUBLIC_PAGES = ['/sign-in', '/welcome', '/reset-password', '/forgot-password', '/q'];

export default async function proxy(req: NextRequest, event: NextFetchEvent) {
  if (PUBLIC_PAGES.some((p) => req.nextUrl.pathname === p || req.nextUrl.pathname.startsWith(`${p}/`))) return withHeaders(req);
  const res = await signedIn(req as NextRequestWithAuth, event);
  // A redirect to sign in carries the plain security headers (no page, so no policy).
  if (res instanceof Response && !res.headers.has('Content-Security-Policy')) {
    for (const [k, v] of Object.entries(securityHeaders(isHttps(req)))) res.headers.set(k, v);
  }
  return res;
}

export const config = {
  // Pages only: API routes set their own headers (server/api/route.ts) and must not pass through a proxy that would
  // buffer their bodies. Prefetches of a page need no policy of their own.
  matcher: [
    {
      source: '/((?!api|_next/static|_next/image|favicon.ico|icon.svg).*)',
      missing: [
        { type: 'header', key: 'next-router-prefetch' },
        { type: 'header', key: 'purpose', value: 'prefetch' },
      ],
    },
  ],
};
