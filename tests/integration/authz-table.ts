/**
 * The authorization matrix: every API route handler × who asks, with the status each must get.
 * `other` is the owner of another shop asking for this shop's resource (404: it must not even exist for them).
 * The matrix test fails when a route handler has no row here, or a row names a handler that does not exist.
 */
import type { Role } from '@/lib/auth/permissions';

export type Actor = 'anonymous' | Role | 'other';

export interface AuthzRow {
  route: string;
  method: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  /** A valid body, so an allowed actor is judged on access, not on input. */
  body?: unknown;
  expect: Record<Actor, number>;
}

const validJob = { name: 'Matrix test job', customer: 'Test customer' };

export const PUBLIC_ROUTES = ['/api/auth/[...nextauth]', '/api/health'];

export const AUTHZ_TABLE: AuthzRow[] = [
  { route: '/api/jobs', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 200 } },
  { route: '/api/jobs', method: 'POST', body: validJob, expect: { anonymous: 401, owner: 201, estimator: 201, cutter: 403, other: 201 } },
  { route: '/api/jobs/[id]', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 404 } },
  { route: '/api/jobs/[id]', method: 'PATCH', body: { status: 'won' }, expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 404 } },
  { route: '/api/jobs/[id]', method: 'DELETE', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 404 } },
  { route: '/api/team', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 200 } },
  {
    route: '/api/team',
    method: 'POST',
    body: { name: 'Matrix Person', email: 'EMAIL', role: 'cutter', password: 'long-enough-password' },
    expect: { anonymous: 401, owner: 201, estimator: 403, cutter: 403, other: 201 },
  },
  { route: '/api/team/[id]', method: 'PATCH', body: { role: 'estimator' }, expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 404 } },
  { route: '/api/settings', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 200 } },
  { route: '/api/settings', method: 'PATCH', body: { wastePercent: 12 }, expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 200 } },
];
