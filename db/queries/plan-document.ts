import type { ShopScope } from '../scope';
import { and, eq, sql } from 'drizzle-orm';
import { isoText, PreparedRead } from '../prepared';
import { plans } from '../schema';
import { notFound } from '@/lib/errors';
import { readStoredPlan } from '@/lib/nesting/read-plan';
import { PLAN_VERSION } from '@/shared/schemas/nesting';

/**
 * A saved plan read through `readStoredPlan`: its document (older versions migrated forward, unknown ones refused)
 * and its request (null when it no longer parses), scoped to the shop. The document is the single source of truth for placements and saw order; the
 * plan_pieces / placements / saw_steps rows are written from it when a plan is released.
 */
export async function getPlan({ db, shopId }: ShopScope, planId: string) {
  const [row] = await db
    .select()
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.id, planId)));
  if (!row) throw notFound('That plan');
  return { ...row, ...readStoredPlan(row) };
}

/**
 * A plan as GET /api/plans/:id answers it, as JSON text, when its document is of the current version: the stored
 * request and document go out as the database holds them, neither parsed nor checked again. Every write checked them
 * against their schemas first (judgePlan, PUT's planSchema.parse), and a document of the current version needs no
 * migration; a 61 kB document cost about 13 ms to parse, check and write out again on each read. `older` for a
 * document of an earlier version (the caller reads it through `getPlan`, which migrates it).
 */
export async function getPlanAsJson({ db, shopId }: ShopScope, planId: string): Promise<{ status: string; json: string } | 'older'> {
  const [row] = (await planAsJson.rows(db, { shopId, planId })) as {
    id: string;
    jobId: string;
    name: string;
    status: string;
    yieldRatio: number | null;
    costCents: number | null;
    createdAt: string;
    updatedAt: string;
    version: number;
    request: string;
    document: string;
  }[];
  if (!row) throw notFound('That plan');
  if (Number(row.version) !== PLAN_VERSION) return 'older';
  const head = JSON.stringify({
    id: row.id,
    jobId: row.jobId,
    name: row.name,
    status: row.status,
    yieldRatio: row.yieldRatio == null ? null : Number(row.yieldRatio),
    costCents: row.costCents == null ? null : Number(row.costCents),
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  });
  return { status: row.status, json: `${head.slice(0, -1)},"request":${row.request},"document":${row.document}}` };
}

/** Prepared once (db/prepared.ts): every plan view runs it. */
const planAsJson = new PreparedRead<{ shopId: string; planId: string }>(
  (v) => sql`
    select ${plans.id} as "id", ${plans.jobId} as "jobId", ${plans.name} as "name", ${plans.status}::text as "status",
           ${plans.yieldRatio} as "yieldRatio", ${plans.costCents} as "costCents", ${isoText(plans.createdAt)} as "createdAt",
           ${isoText(plans.updatedAt)} as "updatedAt", ${plans.version} as "version", ${plans.request}::text as "request",
           ${plans.document}::text as "document"
      from ${plans}
     where ${plans.shopId} = ${v('shopId')} and ${plans.id} = ${v('planId')}`,
);
