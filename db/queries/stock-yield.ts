import type { ShopScope } from '../scope';
import { and, desc, eq, sql } from 'drizzle-orm';
import { jobs, offcuts, plans, users } from '../schema';
import { readPlan } from '@/lib/nesting';
import { planFigures } from '@/lib/stock/finish-plan';
import type { YieldLedger } from '@/shared/wire/plans';

/**
 * Finished plans for the yield ledger: yield, waste and cost recorded at done, with the stock area that weighs them.
 * Waste is split into the saw's (trim, kerf, pieces too small to keep) and parts spoiled at the saw (re-cuts).
 */
export async function listYieldLedger({ db, shopId }: ShopScope): Promise<YieldLedger> {
  const rows = await db
    .select({
      id: plans.id,
      name: plans.name,
      jobId: jobs.id,
      jobName: jobs.name,
      yieldRatio: plans.yieldRatio,
      wasteRatio: plans.wasteRatio,
      spoiledRatio: plans.spoiledRatio,
      recutPlan: plans.recutPlan,
      costCents: plans.costCents,
      finishedAt: plans.finishedAt,
      updatedAt: plans.updatedAt,
      finishedBy: users.name,
      document: plans.document,
      offcutsRacked: sql<number>`(select count(*) from ${offcuts} where ${offcuts.sourcePlanId} = ${plans.id})`.mapWith(Number),
    })
    .from(plans)
    .innerJoin(jobs, eq(jobs.id, plans.jobId))
    .leftJoin(users, eq(users.id, plans.finishedBy))
    .where(and(eq(plans.shopId, shopId), eq(plans.status, 'done')))
    .orderBy(desc(plans.finishedAt), desc(plans.updatedAt));
  const ledger = rows.map(({ document, ...r }) => ({
    ...r,
    spoiledRatio: r.spoiledRatio ?? 0,
    sawWasteRatio: r.wasteRatio == null ? null : Math.max(0, r.wasteRatio - (r.spoiledRatio ?? 0)),
    stockArea: planFigures(readPlan(document)).stockArea,
  }));
  const area = ledger.reduce((n, r) => n + r.stockArea, 0);
  // Weighted by stock area: a plan of twenty sheets counts for more than an offcut job.
  const weighted = (pick: (r: (typeof ledger)[number]) => number | null) =>
    area > 0 ? ledger.reduce((n, r) => n + (pick(r) ?? 0) * r.stockArea, 0) / area : null;
  return {
    plans: ledger,
    totals: {
      stockArea: area,
      yieldRatio: weighted((r) => r.yieldRatio),
      wasteRatio: weighted((r) => r.wasteRatio),
      sawWasteRatio: weighted((r) => r.sawWasteRatio),
      spoiledRatio: weighted((r) => r.spoiledRatio),
      costCents: ledger.reduce((n, r) => n + (r.costCents ?? 0), 0),
    },
  };
}
