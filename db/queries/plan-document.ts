import { and, eq } from 'drizzle-orm';
import type { Db } from '../open';
import { plans } from '../schema';
import { readPlan } from '@/lib/nesting';

/**
 * A saved plan with its document read through `readPlan` (older versions migrated forward, unknown ones refused),
 * scoped to the shop. The document is the single source of truth for placements and saw order; the
 * plan_pieces / placements / saw_steps rows are written from it when a plan is released.
 */
export async function getPlan(db: Db, shopId: string, planId: string) {
  const [row] = await db
    .select()
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.id, planId)));
  if (!row) return null;
  return { ...row, document: readPlan(row.document) };
}
