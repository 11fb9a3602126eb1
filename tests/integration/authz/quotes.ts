import { jobs } from '@/db/schema';
import { jobWithDraftQuote } from '../../support/quote-fixture';
import { nextNumber } from '../../support/unique';
import type { AuthzFixtures, AuthzRow } from './types';

const freshJob = async ({ db, mine }: AuthzFixtures) => {
  const [j] = await db
    .insert(jobs)
    .values({ shopId: mine.id, name: `Matrix quote job ${nextNumber()}` })
    .returning();
  return { id: j.id };
};
const freshDraft = async ({ db, mine }: AuthzFixtures) => ({ id: (await jobWithDraftQuote(db, mine.id)).revision.id });
const freshSent = async ({ db, mine }: AuthzFixtures) => {
  const { revision } = await jobWithDraftQuote(db, mine.id);
  const { quoteRevisions } = await import('@/db/schema');
  const { eq } = await import('drizzle-orm');
  await db.update(quoteRevisions).set({ status: 'sent', sentAt: new Date() }).where(eq(quoteRevisions.id, revision.id));
  return { id: revision.id };
};

// Quotes carry cost and margin: owner and estimator only, never the cutter.
const office = (ok: number) => ({ anonymous: 401, owner: ok, estimator: ok, cutter: 403, other: 404 });

export const rows: AuthzRow[] = [
  { route: '/api/jobs/[id]/quotes', method: 'GET', target: freshJob, expect: office(200) },
  { route: '/api/jobs/[id]/quotes', method: 'POST', target: freshJob, body: { planId: null }, expect: office(201) },
  { route: '/api/quotes/[id]', method: 'GET', target: freshDraft, expect: office(200) },
  { route: '/api/quotes/[id]', method: 'PATCH', target: freshDraft, body: { taxPercent: 8.25 }, expect: office(200) },
  { route: '/api/quotes/[id]/pdf', method: 'GET', target: freshDraft, expect: office(200) },
  { route: '/api/quotes/[id]/send', method: 'POST', target: freshDraft, expect: office(200) },
  { route: '/api/quotes/[id]/revisions', method: 'POST', target: freshSent, expect: office(201) },
];
