import { NextResponse } from 'next/server';
import { idParams, route } from '@/server/api/route';
import { releasePlan, StockShortage } from '@/db/queries/plan-lifecycle';

// POST /api/plans/:id/release – reserve exactly the stock the plan uses, all or nothing
export const POST = route({ permission: 'plans:release', params: idParams }, async ({ db, user, params }) => {
  try {
    return await releasePlan(db, { shopId: user.shopId, userId: user.id, planId: params.id });
  } catch (error) {
    if (!(error instanceof StockShortage)) throw error;
    // Nothing was reserved: name every piece that is gone and point back to the Nest screen to re-nest.
    return NextResponse.json({ error: error.message, missing: error.missing, renest: `/jobs/${error.jobId}/plan` }, { status: 409 });
  }
});
