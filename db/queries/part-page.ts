import 'server-only';
import { and, desc, eq, ne, sql } from 'drizzle-orm';
import type { Db } from '../open';
import type { ShopScope } from '../scope';
import { notFound } from '@/lib/errors';
import { customers, jobs, parts, plans, recuts } from '../schema';
import { readPlan } from '@/lib/nesting';
import { recutLabel } from '@/lib/recuts/recuts';
import { recutSize } from './recuts';
import { stockPieceName } from '@/lib/nesting/saw-order';

/**
 * A part as its tag's QR code shows it: the part, its job, and every plan of the job that places it, with the stock
 * piece each instance is cut from. Drafts only for people who may edit plans; cancelled plans are left out. A tag of
 * a re-cut plan carries the re-cut's id: its page is the re-cut, sized as the damaged part was.
 */
export async function getPartPage({ db, shopId }: ShopScope, partId: string, { drafts }: { drafts: boolean }) {
  const [part] = await db
    .select()
    .from(parts)
    .where(and(eq(parts.shopId, shopId), eq(parts.id, partId)));
  const recut = part ? null : await recutAsPart(db, shopId, partId);
  return part
    ? partPage(db, shopId, part, { drafts, recutOf: null })
    : recut
      ? partPage(db, shopId, recut.part, { drafts, recutOf: recut.of })
      : Promise.reject(notFound('That part'));
}

async function recutAsPart(db: Db, shopId: string, id: string) {
  const [r] = await db
    .select()
    .from(recuts)
    .where(and(eq(recuts.shopId, shopId), eq(recuts.id, id)));
  if (!r) return null;
  const part: typeof parts.$inferSelect = {
    id: r.id,
    shopId: r.shopId,
    jobId: r.jobId,
    label: `${recutLabel(r)} · re-cut`,
    ...recutSize(r),
    jointAllowance: r.jointAllowance,
    notes: r.reason,
    drawerScheduleId: null,
    role: null,
    machining: null,
    sort: 0,
    createdAt: r.createdAt,
  };
  return { part, of: recutLabel(r) };
}

async function partPage(db: Db, shopId: string, part: typeof parts.$inferSelect, { drafts, recutOf }: { drafts: boolean; recutOf: string | null }) {
  const partId = part.id;
  const [job] = await db
    .select({ id: jobs.id, name: jobs.name, customer: sql<string>`coalesce(${customers.name}, '')` })
    .from(jobs)
    .leftJoin(customers, eq(customers.id, jobs.customerId))
    .where(and(eq(jobs.shopId, shopId), eq(jobs.id, part.jobId)));
  const rows = await db
    .select({ id: plans.id, name: plans.name, status: plans.status, document: plans.document, updatedAt: plans.updatedAt })
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.jobId, part.jobId), ne(plans.status, 'cancelled')))
    .orderBy(desc(plans.updatedAt));
  const placedIn = rows
    .filter((r) => drafts || r.status !== 'draft')
    .map((r) => {
      const doc = readPlan(r.document);
      const places = doc.pieces.flatMap((piece, index) =>
        piece.placements
          .filter((p) => p.partId === partId)
          .map((p) => ({ pieceIndex: index, pieceName: stockPieceName(index), instance: p.instance, piece })),
      );
      const unplaced = doc.unplaced.filter((u) => u.partId === partId);
      return { id: r.id, name: r.name, status: r.status, places, unplaced };
    });
  return { part, job, plans: placedIn, recutOf };
}
