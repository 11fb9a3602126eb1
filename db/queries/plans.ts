import type { ShopScope } from '../scope';
import { and, desc, eq, inArray } from 'drizzle-orm';
import { jobs, plans } from '../schema';

const planRow = {
  id: plans.id,
  name: plans.name,
  status: plans.status,
  yieldRatio: plans.yieldRatio,
  costCents: plans.costCents,
  updatedAt: plans.updatedAt,
  jobId: jobs.id,
  jobName: jobs.name,
};

export async function listPlansByStatus({ db, shopId }: ShopScope, statuses: ('draft' | 'released' | 'cutting' | 'done' | 'cancelled')[]) {
  return db
    .select(planRow)
    .from(plans)
    .innerJoin(jobs, eq(jobs.id, plans.jobId))
    .where(and(eq(plans.shopId, shopId), inArray(plans.status, statuses)))
    .orderBy(desc(plans.updatedAt));
}
