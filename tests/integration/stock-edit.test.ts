import { describe, expect, test } from 'vitest';
import { and, eq } from 'drizzle-orm';
import type { Db } from '@/db/open';
import { auditEvents, stockItems, stockMovements } from '@/db/schema';
import { createStockItem, ledgerMismatches, listDetailChanges } from '@/db/queries/stock';
import { stockItemSchema } from '@/shared/schemas/stock';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request, type TestUser } from '../support/fixtures';
import { PATCH } from '@/app/api/stock/[id]/route';

let db: Db;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ db, fx } = app));

const newBoard = () =>
  createStockItem(
    { db, shopId: fx.mine.id, userId: fx.owner.id },
    stockItemSchema.parse({
      kind: 'board',
      material: 'Cherry',
      nominalThickness: '4/4',
      thickness: 21,
      length: 2438,
      width: 152,
      onHand: 12,
      lowStockAt: 4,
      costCents: 795,
      supplier: 'Millbrook',
      location: 'Lumber rack 3',
      grade: 'FAS',
      surfacing: 'S2S',
      buyable: true,
    }),
  );

async function patch(id: string, body: unknown, user: TestUser) {
  const res = await PATCH(await request(`/api/stock/${id}`, { method: 'PATCH', body, user }), { params: Promise.resolve({ id }) });
  return { status: res.status, json: await res.json() };
}

const stored = async (id: string) => (await db.select().from(stockItems).where(eq(stockItems.id, id)))[0];

describe('PATCH /api/stock/:id', () => {
  test('the owner changes cost and location; every other detail and the counts stay as they were', async () => {
    const board = await newBoard();
    const res = await patch(board.id, { costCents: 850, location: 'Lumber rack 4' }, fx.owner);
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ costCents: 850, location: 'Lumber rack 4' });
    const after = await stored(board.id);
    expect(after).toEqual({ ...board, costCents: 850, location: 'Lumber rack 4' });
  });

  test('writes one audit row saying what changed from what, and no stock movement (no count moved)', async () => {
    const board = await newBoard();
    await patch(board.id, { costCents: 850, location: 'Lumber rack 4', supplier: 'Millbrook' }, fx.owner);
    const audit = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.entityId, board.id), eq(auditEvents.action, 'update')));
    expect(audit).toHaveLength(1);
    expect(audit[0]).toMatchObject({ shopId: fx.mine.id, userId: fx.owner.id, entity: 'stock-item' });
    // The supplier was sent unchanged, so only cost and location are recorded.
    expect(audit[0].data).toEqual({ changes: { costCents: { from: 795, to: 850 }, location: { from: 'Lumber rack 3', to: 'Lumber rack 4' } } });
    const moves = await db.select().from(stockMovements).where(eq(stockMovements.stockItemId, board.id));
    expect(moves.map((m) => m.kind)).toEqual(['received']); // the opening count only
    expect(await ledgerMismatches({ db, shopId: fx.mine.id })).toEqual([]);

    const [history] = await listDetailChanges({ db, shopId: fx.mine.id }, { stockItemId: board.id });
    expect(history).toMatchObject({ who: 'Olu Birch', item: 'Cherry 4/4', changes: { costCents: { from: 795, to: 850 } } });
  });

  test('a patch that changes nothing writes no audit row', async () => {
    const board = await newBoard();
    expect((await patch(board.id, { location: 'Lumber rack 3' }, fx.owner)).status).toBe(200);
    expect(await listDetailChanges({ db, shopId: fx.mine.id }, { stockItemId: board.id })).toEqual([]);
  });

  test.each([
    ['estimator', 403],
    ['cutter', 403],
  ] as const)('the %s is refused with %i and nothing changes', async (role, status) => {
    const board = await newBoard();
    expect((await patch(board.id, { costCents: 1 }, fx[role])).status).toBe(status);
    expect((await stored(board.id)).costCents).toBe(795);
  });

  test('another shop’s owner gets 404 for this shop’s size, and it stays as it was', async () => {
    const board = await newBoard();
    const res = await patch(board.id, { location: 'Their rack' }, fx.otherOwner);
    expect(res.status).toBe(404);
    expect((await stored(board.id)).location).toBe('Lumber rack 3');
  });

  test('a negative cost is a 422 with the message on the cost field; nothing is written', async () => {
    const board = await newBoard();
    const res = await patch(board.id, { costCents: -500, location: 'Lumber rack 9' }, fx.owner);
    expect(res.status).toBe(422);
    expect(res.json.fields).toEqual({ costCents: ['A price cannot be negative.'] });
    expect(await stored(board.id)).toEqual(board);
  });

  test.each([
    ['length', { length: 3000 }],
    ['thickness', { thickness: 19 }],
    ['grain', { grain: 'none' }],
    ['onHand', { onHand: 50 }],
    ['kind', { kind: 'sheet' }],
  ])('the size and counts cannot be patched: %s is a 422 on that field', async (field, body) => {
    const board = await newBoard();
    const res = await patch(board.id, body, fx.owner);
    expect(res.status).toBe(422);
    expect(Object.keys(res.json.fields)).toEqual([field]);
    expect(await stored(board.id)).toEqual(board);
  });
});
