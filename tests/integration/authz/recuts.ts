import { jobs, recuts } from '@/db/schema';
import type { AuthzFixtures, AuthzRow } from './types';

/** A job of its own with one open re-cut (a side damaged at the saw). */
const freshRecut = async ({ db, mine }: AuthzFixtures) => {
  const [job] = await db.insert(jobs).values({ shopId: mine.id, name: 'Re-cut target job', status: 'cutting' }).returning();
  const [r] = await db
    .insert(recuts)
    .values({
      shopId: mine.id,
      jobId: job.id,
      label: 'Side',
      instance: 2,
      length: 700,
      width: 560,
      thickness: 18,
      material: 'Birch ply',
      reason: 'Tear-out',
    })
    .returning();
  return { recutId: r.id, jobId: job.id };
};

const jobWithRecut = async (fx: AuthzFixtures) => ({ id: (await freshRecut(fx)).jobId });
const openRecut = async (fx: AuthzFixtures) => ({ id: (await freshRecut(fx)).recutId });

// The cutter records damaged parts when finishing (plans:finish, in stock.ts) and reads the re-cut list; nesting,
// releasing and cancelling re-cuts are the estimator's and owner's (the nest and release rows are in plans.ts and stock.ts).
export const rows: AuthzRow[] = [
  {
    route: '/api/jobs/[id]/recuts',
    method: 'GET',
    target: jobWithRecut,
    expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 404 },
  },
  {
    route: '/api/recuts/[id]/cancel',
    method: 'POST',
    target: openRecut,
    body: { reason: 'Made from a scrap at the bench' },
    expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 404 },
  },
];
