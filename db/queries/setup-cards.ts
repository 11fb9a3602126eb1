import type { SavedSetupCard } from '@/shared/wire/settings';
import type { Scope, ShopScope } from '../scope';
import { and, asc, eq } from 'drizzle-orm';
import type { Db } from '../open';
import { setupCards } from '../schema';
import { SETUP_CARD_TOLERANCE_MM } from '@/lib/joinery/setup-cards';
import type { SetupCard, SetupCardField } from '@/shared/schemas/setup-card';
import { recordAudit } from './audit';
import { conflict, notFound } from '@/lib/errors';

export type { SavedSetupCard } from '@/shared/wire/settings';

type Row = typeof setupCards.$inferSelect;

// The column is typed as a record in the table definition; cards store their fields as the schema's ordered list.
const toCard = (r: Row): SavedSetupCard => ({
  id: r.id,
  joint: r.joint as SetupCard['joint'],
  stockThickness: r.stockThickness,
  fields: (Array.isArray(r.fields) ? r.fields : []) as SetupCardField[],
  note: r.note,
  updatedAt: r.updatedAt.toISOString(),
});
const fieldsColumn = (fields: SetupCardField[]) => fields as unknown as Row['fields'];

export async function listSetupCards({ db, shopId }: ShopScope): Promise<SavedSetupCard[]> {
  const rows = await db.select().from(setupCards).where(eq(setupCards.shopId, shopId)).orderBy(asc(setupCards.joint), asc(setupCards.stockThickness));
  return rows.map(toCard);
}

/** One card per joint and stock thickness: a second card for the same pair is refused (409), naming the first. */
async function refuseDuplicate(db: Db, shopId: string, card: SetupCard, exceptId?: string) {
  const same = (await listSetupCards({ db, shopId })).find(
    (c) => c.id !== exceptId && c.joint === card.joint && Math.abs(c.stockThickness - card.stockThickness) <= SETUP_CARD_TOLERANCE_MM,
  );
  if (same) throw conflict('The shop already has a setup card for this joint and stock thickness: edit that one.');
}

export async function createSetupCard({ db, shopId, userId }: Scope, card: SetupCard): Promise<SavedSetupCard> {
  return db.transaction(async (tx) => {
    await refuseDuplicate(tx, shopId, card);
    const [row] = await tx
      .insert(setupCards)
      .values({ shopId, joint: card.joint, stockThickness: card.stockThickness, fields: fieldsColumn(card.fields), note: card.note })
      .returning();
    await recordAudit(tx, { shopId, userId, action: 'create', entity: 'setup-card', entityId: row.id, data: card });
    return toCard(row);
  });
}

export async function updateSetupCard({ db, shopId, userId }: Scope, id: string, card: SetupCard): Promise<SavedSetupCard> {
  return db.transaction(async (tx) => {
    await refuseDuplicate(tx, shopId, card, id);
    const [row] = await tx
      .update(setupCards)
      .set({ joint: card.joint, stockThickness: card.stockThickness, fields: fieldsColumn(card.fields), note: card.note, updatedAt: new Date() })
      .where(and(eq(setupCards.shopId, shopId), eq(setupCards.id, id)))
      .returning();
    if (!row) throw notFound('That setup card');
    await recordAudit(tx, { shopId, userId, action: 'update', entity: 'setup-card', entityId: id, data: card });
    return toCard(row);
  });
}

export async function deleteSetupCard({ db, shopId, userId }: Scope, id: string): Promise<void> {
  await db.transaction(async (tx) => {
    const rows = await tx
      .delete(setupCards)
      .where(and(eq(setupCards.shopId, shopId), eq(setupCards.id, id)))
      .returning({ joint: setupCards.joint });
    if (!rows.length) throw notFound('That setup card');
    await recordAudit(tx, { shopId, userId, action: 'delete', entity: 'setup-card', entityId: id, data: rows[0] });
  });
}
