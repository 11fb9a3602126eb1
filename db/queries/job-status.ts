import type { ShopScope, SystemScope } from '../scope';
import { and, eq, inArray, sql } from 'drizzle-orm';
import { notFound } from '@/lib/errors';
import { jobs, plans, quotePayments, quoteRevisions, recuts } from '../schema';
import type { Role } from '@/lib/auth/permissions';
import { followPlans, manualStatusChoices, type JobFacts } from '@/lib/jobs/status';
import type { JobStatus } from '@/shared/schemas/job';
import { recordAudit } from './audit';

/** What a job's plans and re-cuts say about it, read inside the caller's transaction. */
export async function jobFacts({ db: tx, shopId }: ShopScope, jobId: string, acceptedAt: Date | null): Promise<JobFacts> {
  const [counts] = await tx
    .select({
      activePlans: sql<number>`count(*) filter (where ${plans.status} in ('released', 'cutting'))`.mapWith(Number),
      donePlans: sql<number>`count(*) filter (where ${plans.status} = 'done')`.mapWith(Number),
    })
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.jobId, jobId)));
  const [open] = await tx
    .select({ n: sql<number>`count(*)`.mapWith(Number) })
    .from(recuts)
    .where(and(eq(recuts.shopId, shopId), eq(recuts.jobId, jobId), inArray(recuts.status, ['open', 'planned'])));
  const [quoted] = await tx
    .select({
      out: sql<number>`count(*) filter (where ${quoteRevisions.status} = 'sent')`.mapWith(Number),
      // The last quote the customer declined or let run out (by when that happened).
      lastAnswer: sql<
        'declined' | 'expired' | null
      >`(array_agg(${quoteRevisions.status}::text order by ${quoteRevisions.updatedAt} desc) filter (where ${quoteRevisions.status} in ('declined', 'expired')))[1]`,
    })
    .from(quoteRevisions)
    .where(and(eq(quoteRevisions.shopId, shopId), eq(quoteRevisions.jobId, jobId)));
  const [paid] = await tx
    .select({ n: sql<number>`count(*)`.mapWith(Number) })
    .from(quotePayments)
    .where(and(eq(quotePayments.shopId, shopId), eq(quotePayments.jobId, jobId), eq(quotePayments.status, 'paid')));
  return {
    activePlans: counts?.activePlans ?? 0,
    donePlans: counts?.donePlans ?? 0,
    openRecuts: open?.n ?? 0,
    accepted: acceptedAt !== null,
    quoted: (quoted?.out ?? 0) > 0,
    depositPaid: (paid?.n ?? 0) > 0,
    lastQuote: quoted?.lastAnswer ?? null,
  };
}

/**
 * Moves the job to the status its plans, payments and quotes say (an archived job stays archived), after a plan was
 * released, ticked, cancelled or finished, a re-cut cancelled, a quote sent, answered or expired, or a deposit paid. Call it inside that change's transaction, after the change. The
 * job row is locked first so two plans finishing at once settle on one answer.
 */
export async function syncJobStatus({ db: tx, shopId, userId }: SystemScope, jobId: string, cause: string): Promise<JobStatus> {
  const [job] = await tx
    .select({ status: jobs.status, acceptedAt: jobs.acceptedAt })
    .from(jobs)
    .where(and(eq(jobs.shopId, shopId), eq(jobs.id, jobId)))
    .for('update');
  if (!job) throw notFound('That job');
  const next = followPlans(job.status, await jobFacts({ db: tx, shopId }, jobId, job.acceptedAt));
  if (next === job.status) return next;
  await tx.update(jobs).set({ status: next, updatedAt: new Date() }).where(eq(jobs.id, jobId));
  await recordAudit(tx, { shopId, userId, action: 'status', entity: 'job', entityId: jobId, data: { from: job.status, to: next, cause } });
  return next;
}

/**
 * What the job's page needs to offer edits: the statuses this person may pick by hand, and whether the job has
 * history (then it is archived, not deleted).
 */
export async function jobEditOptions({ db, shopId }: ShopScope, jobId: string, role: Role) {
  const [job] = await db
    .select({ status: jobs.status, acceptedAt: jobs.acceptedAt })
    .from(jobs)
    .where(and(eq(jobs.shopId, shopId), eq(jobs.id, jobId)));
  if (!job) throw notFound('That job');
  const [facts, [history]] = await Promise.all([
    jobFacts({ db, shopId }, jobId, job.acceptedAt),
    db
      .select({
        released: sql<number>`count(*) filter (where ${plans.releasedAt} is not null or ${plans.status} in ('released', 'cutting', 'done'))`.mapWith(
          Number,
        ),
      })
      .from(plans)
      .where(and(eq(plans.shopId, shopId), eq(plans.jobId, jobId))),
  ]);
  return { statusChoices: manualStatusChoices(role, job.status, facts), hasHistory: (history?.released ?? 0) > 0, facts };
}
