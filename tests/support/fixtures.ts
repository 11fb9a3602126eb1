import bcrypt from 'bcryptjs';
import { encode } from 'next-auth/jwt';
import { NextRequest } from 'next/server';
import type { Db } from '@/db/open';
import { jobs, shops, users } from '@/db/schema';
import type { Role } from '@/lib/auth/permissions';

export const TEST_SECRET = 'test-secret-0123456789-abcdefghijklmnop-XYZ';
export const TEST_PASSWORD = 'correct-horse-battery';

export interface TestUser {
  id: string;
  shopId: string;
  role: Role;
  tokenVersion: number;
}

/** Two shops: "mine" with one person per role, and "theirs" with an owner, each with a job. */
export async function twoShops(db: Db) {
  const hash = await bcrypt.hash(TEST_PASSWORD, 4);
  const [mine, theirs] = await db
    .insert(shops)
    .values([{ name: 'Birchwood Joinery' }, { name: 'Elm Street Millwork' }])
    .returning();
  const people = await db
    .insert(users)
    .values([
      { shopId: mine.id, email: 'owner@birchwood.example', name: 'Olu Birch', role: 'owner', passwordHash: hash },
      { shopId: mine.id, email: 'est@birchwood.example', name: 'Esme Birch', role: 'estimator', passwordHash: hash },
      { shopId: mine.id, email: 'cut@birchwood.example', name: 'Cato Birch', role: 'cutter', passwordHash: hash },
      { shopId: theirs.id, email: 'owner@elmstreet.example', name: 'Oona Elm', role: 'owner', passwordHash: hash },
    ])
    .returning();
  const [myJob, theirJob] = await db
    .insert(jobs)
    .values([
      { shopId: mine.id, name: 'Birchwood pantry' },
      { shopId: theirs.id, name: 'Elm Street library' },
    ])
    .returning();
  const as = (u: (typeof people)[number]): TestUser => ({ id: u.id, shopId: u.shopId, role: u.role, tokenVersion: u.tokenVersion });
  return {
    mine,
    theirs,
    owner: as(people[0]),
    estimator: as(people[1]),
    cutter: as(people[2]),
    otherOwner: as(people[3]),
    myJob,
    theirJob,
  };
}

export async function sessionCookie(user: TestUser): Promise<string> {
  const token = await encode({
    secret: TEST_SECRET,
    token: { userId: user.id, shopId: user.shopId, role: user.role, tokenVersion: user.tokenVersion },
  });
  return `next-auth.session-token=${token}`;
}

/** The headers a browser sends with a same-origin fetch from one of the app's pages. */
export const BROWSER_HEADERS = { origin: 'http://localhost', 'sec-fetch-site': 'same-origin' } as const;

/**
 * A request as the app's own pages send it (Origin and Sec-Fetch-Site of the app, JSON body). `headers` adds or
 * replaces headers (null removes one); `rawBody` sends text as it is.
 */
export async function request(
  url: string,
  {
    method = 'GET',
    body,
    rawBody,
    user,
    headers: extra = {},
  }: { method?: string; body?: unknown; rawBody?: string; user?: TestUser; headers?: Record<string, string | null> } = {},
): Promise<NextRequest> {
  const headers = new Headers(BROWSER_HEADERS);
  if (user) headers.set('cookie', await sessionCookie(user));
  if (body !== undefined || rawBody !== undefined) headers.set('content-type', 'application/json');
  for (const [k, v] of Object.entries(extra)) {
    if (v === null) headers.delete(k);
    else headers.set(k, v);
  }
  return new NextRequest(new URL(url, 'http://localhost'), {
    method,
    headers,
    body: rawBody ?? (body === undefined ? undefined : JSON.stringify(body)),
  });
}
