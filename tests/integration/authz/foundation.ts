import { jobs, users } from '@/db/schema';
import { uniqueEmail } from '../../support/unique';
import type { AuthzFixtures, AuthzRow } from './types';

const freshJob = async ({ db, mine }: AuthzFixtures) => {
  const [job] = await db.insert(jobs).values({ shopId: mine.id, name: 'Target job' }).returning();
  return { id: job.id };
};

const freshPerson = async ({ db, mine }: AuthzFixtures) => {
  const [u] = await db
    .insert(users)
    .values({ shopId: mine.id, name: 'Target person', email: uniqueEmail('target'), role: 'cutter', passwordHash: 'x' })
    .returning();
  return { id: u.id };
};

export const rows: AuthzRow[] = [
  { route: '/api/jobs', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 200 } },
  {
    route: '/api/jobs',
    method: 'POST',
    body: { name: 'Matrix test job' },
    expect: { anonymous: 401, owner: 201, estimator: 201, cutter: 403, other: 201 },
  },
  { route: '/api/jobs/[id]', method: 'GET', target: freshJob, expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 404 } },
  {
    route: '/api/jobs/[id]',
    method: 'PATCH',
    target: freshJob,
    body: { status: 'accepted' },
    expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 404 },
  },
  { route: '/api/jobs/[id]', method: 'DELETE', target: freshJob, expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 404 } },
  { route: '/api/team', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 200 } },
  {
    route: '/api/team',
    method: 'POST',
    body: { name: 'Matrix Person', email: 'EMAIL', role: 'cutter', password: 'long-enough-password' },
    expect: { anonymous: 401, owner: 201, estimator: 403, cutter: 403, other: 201 },
  },
  {
    route: '/api/team/[id]',
    method: 'PATCH',
    target: freshPerson,
    body: { role: 'estimator' },
    expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 404 },
  },
  { route: '/api/settings', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 200 } },
  {
    route: '/api/settings',
    method: 'PATCH',
    body: { wastePercent: 12 },
    expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 200 },
  },
];
