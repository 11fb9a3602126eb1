import { and, asc, eq } from 'drizzle-orm';
import type { Db } from '../open';
import { parts } from '../schema';

export async function listParts(db: Db, shopId: string, jobId: string) {
  return db
    .select()
    .from(parts)
    .where(and(eq(parts.shopId, shopId), eq(parts.jobId, jobId)))
    .orderBy(asc(parts.sort), asc(parts.createdAt));
}
