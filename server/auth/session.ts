import 'server-only';
import { getToken } from 'next-auth/jwt';
import type { NextRequest } from 'next/server';
import { cookies, headers } from 'next/headers';
import { redirect } from 'next/navigation';
import { cache } from 'react';
import { getDbHandle } from '@/db/client';
import { loadSessionUser, type SessionUser } from '@/db/queries/users';
import { readShopSettings } from '@/db/queries/shops';
import type { DbHandle } from '@/db/open';
import { serverEnv } from '@/lib/env';
import { claimsFromToken } from '@/lib/auth/claims';
import { secureCookies } from './options';
import { decodeSessionToken } from './token';
import { can, type Permission } from '@/lib/auth/permissions';

export type { SessionUser };

/** The signed-in user of an API request, checked against the database, or null. */
export async function userFromRequest(req: NextRequest, handle: Pick<DbHandle, 'db' | 'changes'>): Promise<SessionUser | null> {
  const token = await getToken({ req, secret: serverEnv().NEXTAUTH_SECRET, secureCookie: secureCookies(), decode: decodeSessionToken });
  const claims = claimsFromToken(token);
  return claims ? loadSessionUser(handle, claims) : null;
}

/**
 * The signed-in user of a page render, or null. Once per render (React's cache): the layout and the page ask for it
 * both. The session cookie is decrypted and checked exactly as for an API request (getToken, then the user as the
 * database has them now); next-auth's getServerSession did that and then encrypted a renewed cookie that a server
 * component cannot send anyway, a third of the page's session cost.
 */
export const currentUser = cache(async (): Promise<SessionUser | null> => {
  const [cookieStore, headerList] = await Promise.all([cookies(), headers()]);
  const token = await getToken({
    req: { cookies: cookieStore, headers: headerList } as unknown as NextRequest,
    secret: serverEnv().NEXTAUTH_SECRET,
    secureCookie: secureCookies(),
    decode: decodeSessionToken,
  });
  const claims = claimsFromToken(token);
  return claims ? loadSessionUser(await getDbHandle(), claims) : null;
});

/** For server components: signed in (else to sign-in) and allowed (else to the no-access page). */
export async function requirePageUser(permission?: Permission): Promise<SessionUser> {
  const user = await currentUser();
  if (!user) redirect('/sign-in');
  if (permission && !can(user.role, permission)) redirect(`/no-access?need=${encodeURIComponent(permission)}`);
  return user;
}

/**
 * The signed-in shop's settings for a page render, once per render (React's cache): the shell shows the shop's name,
 * pages its clock and units.
 */
export const currentShopSettings = cache(async (shopId: string) => readShopSettings(await getDbHandle(), shopId));
