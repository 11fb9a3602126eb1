/**
 * The authorization matrix: every API route handler × who asks, with the status each must get. Each feature keeps
 * its rows in its own file in this folder (`export const rows: AuthzRow[]`); the matrix test collects them all and
 * fails when a route handler has no row, or a row names a handler that does not exist.
 * `other` is the owner of another shop asking for a resource of *this* shop (404: it must not exist for them).
 */
import type { Db } from '@/db/open';
import type { Role } from '@/lib/auth/permissions';
import type { twoShops } from '../../support/fixtures';

export type Actor = 'anonymous' | Role | 'other';

export type AuthzFixtures = Awaited<ReturnType<typeof twoShops>> & { db: Db };

export interface AuthzRow {
  /** The route's URL pattern as its folder names it, e.g. `/api/jobs/[id]`. */
  route: string;
  method: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  /** A valid body, so an allowed actor is judged on access, not on input. `EMAIL` is replaced by a fresh address. */
  body?: unknown;
  /** Creates a fresh resource in the first shop ("mine") for each call and returns the path params. */
  target?: (fx: AuthzFixtures) => Promise<Record<string, string>>;
  expect: Record<Actor, number>;
}

/** Routes anyone may call (they reveal nothing about any shop). */
export const PUBLIC_ROUTES = ['/api/auth/[...nextauth]', '/api/health'];

/** Routes called by another service, not a browser: judged by the signature on the body, not by Origin or type. */
export const SIGNED_BY_SERVICE = ['/api/payments/webhook'];
