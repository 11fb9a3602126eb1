import type { SavedSlideModel } from '@/shared/wire/settings';
import type { Scope, ShopScope, SystemScope } from '../scope';
import { and, asc, eq, ne, sql } from 'drizzle-orm';
import type { Db } from '../open';
import { slideModels } from '../schema';
import type { SlideModel, SlideModelKind, SlideWidthRule } from '@/shared/schemas/slide-model';
import { recordAudit } from './audit';
import { conflict, notFound } from '@/lib/errors';

export type { SavedSlideModel } from '@/shared/wire/settings';

type Row = typeof slideModels.$inferSelect;

const toModel = (r: Row): SavedSlideModel => ({
  id: r.id,
  kind: r.kind as SlideModelKind,
  name: r.name,
  lengths: r.lengths,
  widthRule: r.widthRule as SlideWidthRule,
  widthDeduction: r.widthDeduction,
  maxSideThickness: r.maxSideThickness,
  bottomRecess: r.bottomRecess,
  heightClearance: r.heightClearance,
  rearClearance: r.rearClearance,
  updatedAt: r.updatedAt.toISOString(),
});

/** The shop's slide models, undermount first, by name. */
export async function listSlideModels({ db, shopId }: ShopScope): Promise<SavedSlideModel[]> {
  const rows = await db
    .select()
    .from(slideModels)
    .where(eq(slideModels.shopId, shopId))
    .orderBy(sql`${slideModels.kind} = 'side-mount'`, asc(slideModels.name));
  return rows.map(toModel);
}

/** One model per name in a shop, whatever the case: a second "Halbrook UM-58" is refused (409). */
async function refuseDuplicate(db: Db, shopId: string, name: string, exceptId?: string) {
  const same = await db
    .select({ id: slideModels.id })
    .from(slideModels)
    .where(
      and(eq(slideModels.shopId, shopId), sql`lower(${slideModels.name}) = lower(${name})`, exceptId ? ne(slideModels.id, exceptId) : undefined),
    );
  if (same.length) throw conflict(`The shop already has a slide model named “${name}”: edit that one, or give this one another name.`);
}

const columns = (m: SlideModel) => ({
  kind: m.kind,
  name: m.name,
  lengths: m.lengths,
  widthRule: m.widthRule,
  widthDeduction: m.widthDeduction,
  maxSideThickness: m.maxSideThickness,
  bottomRecess: m.bottomRecess,
  heightClearance: m.heightClearance,
  rearClearance: m.rearClearance,
});

export async function createSlideModel({ db, shopId, userId }: SystemScope, model: SlideModel): Promise<SavedSlideModel> {
  return db.transaction(async (tx) => {
    await refuseDuplicate(tx, shopId, model.name);
    const [row] = await tx
      .insert(slideModels)
      .values({ shopId, ...columns(model) })
      .returning();
    await recordAudit(tx, { shopId, userId, action: 'create', entity: 'slide-model', entityId: row.id, data: model });
    return toModel(row);
  });
}

/** Null when the model is not this shop's. Saved drawer schedules keep the rule they were sized by. */
export async function updateSlideModel({ db, shopId, userId }: Scope, id: string, model: SlideModel): Promise<SavedSlideModel> {
  return db.transaction(async (tx) => {
    await refuseDuplicate(tx, shopId, model.name, id);
    const [row] = await tx
      .update(slideModels)
      .set({ ...columns(model), updatedAt: new Date() })
      .where(and(eq(slideModels.shopId, shopId), eq(slideModels.id, id)))
      .returning();
    if (!row) throw notFound('That slide model');
    await recordAudit(tx, { shopId, userId, action: 'update', entity: 'slide-model', entityId: id, data: model });
    return toModel(row);
  });
}

export async function deleteSlideModel({ db, shopId, userId }: Scope, id: string): Promise<void> {
  await db.transaction(async (tx) => {
    const rows = await tx
      .delete(slideModels)
      .where(and(eq(slideModels.shopId, shopId), eq(slideModels.id, id)))
      .returning({ name: slideModels.name });
    if (!rows.length) throw notFound('That slide model');
    await recordAudit(tx, { shopId, userId, action: 'delete', entity: 'slide-model', entityId: id, data: rows[0] });
  });
}
