import 'server-only';
import { and, desc, eq, ne } from 'drizzle-orm';
import type { Db } from '@/db/open';
import { jobs, parts, plans } from '@/db/schema';
import { readPlan } from '@/lib/nesting';
import { stockPieceName } from '@/lib/nesting/saw-order';

/**
 * A part as its tag's QR code shows it: the part, its job, and every plan of the job that places it, with the stock
 * piece each instance is cut from. Drafts only for people who may edit plans; cancelled plans are left out.
 */
export async function getPartPage(db: Db, shopId: string, partId: string, { drafts }: { drafts: boolean }) {
  const [part] = await db.select().from(parts).where(and(eq(parts.shopId, shopId), eq(parts.id, partId)));
  if (!part) return null;
  const [job] = await db.select({ id: jobs.id, name: jobs.name, customer: jobs.customer }).from(jobs).where(and(eq(jobs.shopId, shopId), eq(jobs.id, part.jobId)));
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
        piece.placements.filter((p) => p.partId === partId).map((p) => ({ pieceIndex: index, pieceName: stockPieceName(index), instance: p.instance, piece })),
      );
      const unplaced = doc.unplaced.filter((u) => u.partId === partId);
      return { id: r.id, name: r.name, status: r.status, places, unplaced };
    });
  return { part, job, plans: placedIn };
}
