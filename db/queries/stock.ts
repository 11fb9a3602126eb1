import { and, asc, eq, ne } from 'drizzle-orm';
import type { Db } from '../open';
import { offcuts, stockItems } from '../schema';

export async function listStock(db: Db, shopId: string) {
  return db.select().from(stockItems).where(eq(stockItems.shopId, shopId)).orderBy(asc(stockItems.kind), asc(stockItems.material), asc(stockItems.thicknessMm));
}

export async function listOffcuts(db: Db, shopId: string) {
  return db
    .select()
    .from(offcuts)
    .where(and(eq(offcuts.shopId, shopId), ne(offcuts.status, 'used')))
    .orderBy(asc(offcuts.material), asc(offcuts.thicknessMm));
}
