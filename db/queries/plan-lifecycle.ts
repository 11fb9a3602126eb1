import type { ReleaseResult } from '@/shared/wire/plans';
import type { FinishResult } from '@/shared/wire/plans';
import type { Scope, ShopScope } from '../scope';
import { and, eq, inArray, sql } from 'drizzle-orm';
import type { Db } from '../open';
import { offcuts, placements, planPieces, plans, stockItems, stockMovements } from '../schema';
import { readPlan, readStoredPlan } from '@/lib/nesting/read-plan';
import { FinishChoiceError, finishOutcome, minOffcutFor, type FinishOutcome } from '@/lib/stock/finish-plan';
import { type NestRequest, type Plan, type PlanPiece } from '@/shared/schemas/nesting';
import { finishPlanSchema, type FinishPlanChoices, type FinishPlanInput, type MissingPiece } from '@/shared/schemas/stock';
import { stockRef } from './nest-request';
import { recordAudit } from './audit';
import { syncJobStatus } from './job-status';
import { getShopSettings } from './shops';
import { closeRecuts, holdRecutsForPlan, recordDamagedPieces, reopenRecuts } from './recuts';
import { DomainError, invalid, notFoundBecause, conflict } from '@/lib/errors';

/**
 * A plan moves material: draft → released (its exact stock reserved) → cutting → done (stock consumed, offcuts on
 * the rack, yield recorded), or cancelled (every reservation given back). Every change of a count is one
 * conditional UPDATE (`… where on_hand - reserved >= n`), never a read followed by a write, so racing releases on
 * PGlite or PostgreSQL cannot both take the last sheet; and every change writes one movement row per physical
 * change, with both counts it moved: release +n reserved; cancel −n reserved; done −n on hand and −n reserved (the
 * reserved pieces are cut, and their reservation ends with them: one row, not a release and a cut).
 *
 * Each step also moves the job's status along (db/queries/job-status.ts) and, for a re-cut plan, its re-cuts:
 * release holds them, cancel puts them back on the list, done closes them. Damaged parts at done go on the list.
 *
 * Stock to buy (`buy:<id>` pieces) is not reserved at release: the plan records it as to-buy (plan_pieces.to_buy).
 * Receiving it is an ordinary stock receipt. At done, bought pieces are taken from that size's free count as far as
 * it goes (they were received onto the rack); any not received are logged as received and consumed on the spot,
 * so the ledger still sums to the counts.
 */

type Tx = Db;
type PlanStatus = (typeof plans.$inferSelect)['status'];

export type { MissingPiece };

/** Release refused: these pieces are no longer free. Nothing was reserved. */
export class StockShortage extends DomainError {
  constructor(
    readonly jobId: string,
    readonly missing: MissingPiece[],
  ) {
    const message = `${missing.length} stock piece${missing.length === 1 ? ' is' : 's are'} no longer available. Nothing was reserved; nest the job again against what is left.`;
    // Every piece that is gone, and the Nest screen to re-nest from.
    super('conflict', message, undefined, { missing, renest: `/jobs/${jobId}/plan` });
  }
}

interface PieceGroup {
  ref: { source: 'stock' | 'buy' | 'offcut'; id: string };
  stockId: string;
  count: number;
  piece: PlanPiece;
}

/** The plan's stock pieces grouped by where they come from, sorted by id so concurrent transactions lock rows in one order. */
function groupPieces(plan: Plan): PieceGroup[] {
  const groups = new Map<string, PieceGroup>();
  for (const piece of plan.pieces) {
    const ref = stockRef.parse(piece.stockId);
    if (!ref) throw invalid(`The plan uses stock "${piece.stockId}" that is not from this stock room.`);
    const g = groups.get(piece.stockId);
    if (g) g.count += 1;
    else groups.set(piece.stockId, { ref, stockId: piece.stockId, count: 1, piece });
  }
  return [...groups.values()].sort((a, b) => (a.ref.id < b.ref.id ? -1 : a.ref.id > b.ref.id ? 1 : 0));
}

async function moveStatus(tx: Tx, shopId: string, planId: string, from: PlanStatus[], set: Partial<typeof plans.$inferInsert>, verb: string) {
  const [row] = await tx
    .update(plans)
    .set({ ...set, updatedAt: new Date() })
    .where(and(eq(plans.shopId, shopId), eq(plans.id, planId), inArray(plans.status, from)))
    .returning();
  if (row) return row;
  const [existing] = await tx
    .select({ status: plans.status })
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.id, planId)));
  if (!existing) throw notFoundBecause('That plan was not found.');
  throw conflict(`This plan is ${existing.status}; only a ${from.join(' or ')} plan can be ${verb}.`);
}

const missingFrom = (g: PieceGroup, free: number): MissingPiece => ({
  stockId: g.stockId,
  kind: g.piece.kind,
  material: g.piece.material,
  thickness: g.piece.thickness,
  length: g.piece.length,
  width: g.piece.width,
  needed: g.count,
  free,
});

/** plan_pieces and placements rows, written from the document (the single source of truth) once it is released. */
async function writePieceRows(tx: Tx, shopId: string, planId: string, plan: Plan) {
  const existing = await tx.select({ id: planPieces.id }).from(planPieces).where(eq(planPieces.planId, planId)).limit(1);
  if (existing.length || !plan.pieces.length) return;
  const rows = await tx
    .insert(planPieces)
    .values(
      plan.pieces.map((p, index) => {
        const ref = stockRef.parse(p.stockId);
        return {
          shopId,
          planId,
          index,
          stockItemId: ref && ref.source !== 'offcut' ? ref.id : null,
          offcutId: ref?.source === 'offcut' ? ref.id : null,
          material: p.material,
          thickness: p.thickness,
          length: p.length,
          width: p.width,
          toBuy: ref?.source === 'buy',
        };
      }),
    )
    .returning({ id: planPieces.id, index: planPieces.index });
  const values = rows.flatMap((r) =>
    plan.pieces[r.index].placements.map((pl) => ({
      shopId,
      planPieceId: r.id,
      partId: /^[0-9a-f-]{36}$/.test(pl.partId) ? pl.partId : null,
      instance: pl.instance,
      x: pl.x,
      y: pl.y,
      length: pl.w,
      width: pl.h,
      rotated: pl.rotated,
    })),
  );
  if (values.length) await tx.insert(placements).values(values);
}

export type { ReleaseResult } from '@/shared/wire/plans';

/** Reserves exactly the pieces the plan uses, all or nothing. Throws StockShortage naming every piece that is gone. */
export async function releasePlan({ db, shopId, userId }: Scope, planId: string): Promise<ReleaseResult> {
  return db.transaction(async (tx) => {
    const row = await moveStatus(tx, shopId, planId, ['draft'], { status: 'released', releasedAt: new Date(), releasedBy: userId }, 'released');
    const plan = readPlan(row.document);
    const { reserved, toBuy, missing } = await reservePieces(tx, shopId, groupPieces(plan));
    // Throwing rolls the whole transaction back: the status change and every reservation made above.
    if (missing.length) throw new StockShortage(row.jobId, missing);

    const moves = reservationMoves({ db: tx, shopId, userId }, planId, reserved, `Reserved for plan “${row.name}”`);
    if (moves.length) await tx.insert(stockMovements).values(moves);
    if (row.recutPlan)
      await holdRecutsForPlan(
        { db: tx, shopId },
        planId,
        plan.pieces.flatMap((p) => p.placements.map((pl) => pl.partId)),
      );
    await writePieceRows(tx, shopId, planId, plan);
    await recordAudit(tx, { shopId, userId, action: 'release', entity: 'plan', entityId: planId, data: { reserved, toBuy } });
    const jobStatus = await syncJobStatus({ db: tx, shopId, userId }, row.jobId, `plan “${row.name}” released`);
    return { planId, reserved, toBuy, jobStatus };
  });
}

/**
 * Reserves each group of the plan's pieces with a conditional update (stock: only while enough is free; an offcut:
 * only while it is on the rack), and names every group that could not be had; pieces to buy are listed, not held.
 */
async function reservePieces(tx: Tx, shopId: string, groups: ReturnType<typeof groupPieces>) {
  const missing: MissingPiece[] = [];
  const reserved: ReleaseResult['reserved'] = [];
  const toBuy: ReleaseResult['toBuy'] = [];
  for (const g of groups) {
    if (g.ref.source === 'buy') {
      toBuy.push({ stockId: g.stockId, count: g.count });
    } else if (g.ref.source === 'stock') {
      const done = await tx
        .update(stockItems)
        .set({ reserved: sql`${stockItems.reserved} + ${g.count}` })
        .where(and(eq(stockItems.id, g.ref.id), eq(stockItems.shopId, shopId), sql`${stockItems.onHand} - ${stockItems.reserved} >= ${g.count}`))
        .returning({ id: stockItems.id });
      if (done.length) reserved.push({ stockId: g.stockId, count: g.count });
      else {
        const [now] = await tx
          .select({ free: sql<number>`${stockItems.onHand} - ${stockItems.reserved}` })
          .from(stockItems)
          .where(and(eq(stockItems.id, g.ref.id), eq(stockItems.shopId, shopId)));
        missing.push(missingFrom(g, Math.max(0, Number(now?.free ?? 0))));
      }
    } else {
      const done = await tx
        .update(offcuts)
        .set({ status: 'reserved' })
        .where(and(eq(offcuts.id, g.ref.id), eq(offcuts.shopId, shopId), eq(offcuts.status, 'available')))
        .returning({ id: offcuts.id });
      if (done.length) reserved.push({ stockId: g.stockId, count: 1 });
      else missing.push(missingFrom(g, 0));
    }
  }
  return { reserved, toBuy, missing };
}

/** The ledger's rows for what a release reserved: the counts do not change, what is held does. */
function reservationMoves({ shopId, userId }: Scope, planId: string, reserved: ReleaseResult['reserved'], reason: string) {
  return reserved.map((r) => {
    const ref = stockRef.parse(r.stockId)!;
    return {
      shopId,
      kind: 'reserved' as const,
      quantity: 0,
      reservedChange: r.count,
      planId,
      userId,
      reason,
      ...(ref.source === 'offcut' ? { offcutId: ref.id } : { stockItemId: ref.id }),
    };
  });
}

/** What the plan still holds: net reserved per stock item and per offcut, from its own movement rows. */
export async function heldBy({ db: tx, shopId }: ShopScope, planId: string) {
  const rows = await tx
    .select({
      stockItemId: stockMovements.stockItemId,
      offcutId: stockMovements.offcutId,
      held: sql<number>`sum(${stockMovements.reservedChange})`.mapWith(Number),
    })
    .from(stockMovements)
    .where(and(eq(stockMovements.shopId, shopId), eq(stockMovements.planId, planId)))
    .groupBy(stockMovements.stockItemId, stockMovements.offcutId);
  return {
    items: rows
      .filter((r) => r.stockItemId && r.held > 0)
      .map((r) => ({ id: r.stockItemId!, count: r.held }))
      .sort((a, b) => a.id.localeCompare(b.id)),
    offcuts: rows
      .filter((r) => r.offcutId && r.held > 0)
      .map((r) => r.offcutId!)
      .sort(),
  };
}

/**
 * Ends every reservation the plan holds: given back to the rack (cancel: −n reserved, on hand unchanged) or cut
 * (done: −n on hand and −n reserved in one `consumed` row, since the same pieces leave the rack).
 */
async function giveBack(tx: Tx, shopId: string, planId: string, userId: string, reason: string, then: 'available' | 'used') {
  const held = await heldBy({ db: tx, shopId }, planId);
  const consume = then === 'used';
  const kind = consume ? ('consumed' as const) : ('released' as const);
  for (const item of held.items) {
    const done = await tx
      .update(stockItems)
      .set(
        consume
          ? { reserved: sql`${stockItems.reserved} - ${item.count}`, onHand: sql`${stockItems.onHand} - ${item.count}` }
          : { reserved: sql`${stockItems.reserved} - ${item.count}` },
      )
      .where(and(eq(stockItems.id, item.id), eq(stockItems.shopId, shopId), sql`${stockItems.reserved} >= ${item.count}`))
      .returning({ id: stockItems.id });
    // The CHECK constraints make this impossible unless the ledger and the counts disagree: refuse, change nothing.
    if (!done.length) throw new Error(`Stock item ${item.id} holds fewer reservations than plan ${planId} recorded.`);
    await tx
      .insert(stockMovements)
      .values({ shopId, kind, stockItemId: item.id, quantity: consume ? -item.count : 0, reservedChange: -item.count, planId, userId, reason });
  }
  for (const id of held.offcuts) {
    await tx
      .update(offcuts)
      .set({ status: then })
      .where(and(eq(offcuts.id, id), eq(offcuts.shopId, shopId), eq(offcuts.status, 'reserved')));
    await tx.insert(stockMovements).values({ shopId, kind, offcutId: id, quantity: consume ? -1 : 0, reservedChange: -1, planId, userId, reason });
  }
  return held;
}

/** Gives back every reservation the plan holds; a draft plan simply closes. */
export async function cancelPlan({ db, shopId, userId }: Scope, planId: string) {
  return db.transaction(async (tx) => {
    const row = await moveStatus(tx, shopId, planId, ['draft', 'released', 'cutting'], { status: 'cancelled' }, 'cancelled');
    const held = await giveBack(tx, shopId, planId, userId, `Plan “${row.name}” cancelled: reservation given back`, 'available');
    if (row.recutPlan) await reopenRecuts({ db: tx, shopId }, planId);
    await recordAudit(tx, { shopId, userId, action: 'cancel', entity: 'plan', entityId: planId, data: held });
    const jobStatus = await syncJobStatus({ db: tx, shopId, userId }, row.jobId, `plan “${row.name}” cancelled`);
    return { planId, released: held, jobStatus };
  });
}

/** What the cutter sends at done (parsed again here, so every caller gets the same defaults and checks). */
export type FinishPlanBody = FinishPlanInput;

export type { FinishResult } from '@/shared/wire/plans';

/**
 * Done: consumes what the plan reserved, takes its bought pieces, puts its keepable offcuts on the rack (where the
 * cutter says), marks damaged parts and puts them on the job's re-cut list, closes the re-cuts a re-cut plan cut,
 * and records yield, waste (spoiled parts apart) and cost computed here from the plan itself.
 */
export async function finishPlan({ db, shopId, userId }: Scope, planId: string, input: FinishPlanBody): Promise<FinishResult> {
  const body = finishPlanSchema.parse(input);
  return db.transaction(async (tx) => {
    const row = await moveStatus(
      tx,
      shopId,
      planId,
      ['released', 'cutting'],
      { status: 'done', finishedAt: new Date(), finishedBy: userId },
      'marked done',
    );
    const { document: plan, request } = readStoredPlan(row);
    const outcome = await decideFinish(tx, shopId, plan, request, body);
    const reason = `Cut for plan “${row.name}”`;

    await giveBack(tx, shopId, planId, userId, reason, 'used');
    await consumeBoughtPieces(tx, { shopId, planId, userId, planName: row.name, reason }, plan);
    const created = await rackOffcuts(tx, { shopId, planId, userId, planName: row.name }, outcome.rack);
    await markDamagedPlacements(tx, shopId, planId, plan, outcome.damaged);
    const added = await recordDamagedPieces({ db: tx, shopId, userId }, { plan: row, request, damaged: body.damaged });
    const closed = row.recutPlan ? await closeRecuts({ db: tx, shopId, userId }, planId) : [];

    const { yieldRatio, wasteRatio, spoiledRatio, costCents } = outcome;
    await tx.update(plans).set({ yieldRatio, wasteRatio, spoiledRatio, costCents }).where(eq(plans.id, planId));
    await recordAudit(tx, {
      shopId,
      userId,
      action: 'finish',
      entity: 'plan',
      entityId: planId,
      data: { offcuts: created.length, damaged: body.damaged.length, recutsClosed: closed.length },
    });
    const jobStatus = await syncJobStatus({ db: tx, shopId, userId }, row.jobId, `plan “${row.name}” finished`);
    return {
      planId,
      jobId: row.jobId,
      yieldRatio,
      wasteRatio,
      spoiledRatio,
      costCents,
      offcuts: created,
      damaged: body.damaged.length,
      recutsAdded: added.length,
      recutsClosed: closed.length,
      jobStatus,
    };
  });
}

interface FinishScope {
  shopId: string;
  planId: string;
  userId: string;
  planName: string;
}

/** The shop's rules decide what is racked, what is spoiled and the figures (lib/stock/finish-plan.ts). */
async function decideFinish(tx: Tx, shopId: string, plan: Plan, request: NestRequest | null, body: FinishPlanChoices): Promise<FinishOutcome> {
  const shop = await getShopSettings({ db: tx, shopId });
  if (!shop) throw notFoundBecause('The shop was not found.');
  try {
    return finishOutcome(plan, request, minOffcutFor(request, shop), body);
  } catch (error) {
    if (error instanceof FinishChoiceError) throw invalid(error.message);
    throw error;
  }
}

/**
 * Pieces the plan bought are taken from the rack when they came in meanwhile; the rest were cut on arrival (received
 * and consumed at once), so the ledger still sums to the counts.
 */
async function consumeBoughtPieces(tx: Tx, scope: FinishScope & { reason: string }, plan: Plan): Promise<void> {
  const { shopId, planId, userId, planName, reason } = scope;
  for (const g of groupPieces(plan).filter((g) => g.ref.source === 'buy')) {
    const [item] = await tx
      .select({ free: sql<number>`${stockItems.onHand} - ${stockItems.reserved}`.mapWith(Number) })
      .from(stockItems)
      .where(and(eq(stockItems.id, g.ref.id), eq(stockItems.shopId, shopId)))
      .for('update');
    if (!item) throw conflict(`A size this plan bought is no longer in the stock room (${g.piece.material}).`);
    const fromRack = Math.min(g.count, Math.max(0, item.free));
    const onArrival = g.count - fromRack;
    if (fromRack) {
      await tx
        .update(stockItems)
        .set({ onHand: sql`${stockItems.onHand} - ${fromRack}` })
        .where(and(eq(stockItems.id, g.ref.id), sql`${stockItems.onHand} - ${stockItems.reserved} >= ${fromRack}`));
      await tx.insert(stockMovements).values({
        shopId,
        kind: 'consumed',
        stockItemId: g.ref.id,
        quantity: -fromRack,
        planId,
        userId,
        reason: `${reason} (bought, taken from the rack)`,
      });
    }
    if (onArrival) {
      await tx.insert(stockMovements).values([
        { shopId, kind: 'received', stockItemId: g.ref.id, quantity: onArrival, planId, userId, reason: `Bought for plan “${planName}”` },
        { shopId, kind: 'consumed', stockItemId: g.ref.id, quantity: -onArrival, planId, userId, reason: `${reason} (bought, cut on arrival)` },
      ]);
    }
  }
}

/** Offcuts on the rack where the cutter put them, each with its movement. */
async function rackOffcuts(tx: Tx, scope: FinishScope, rack: FinishOutcome['rack']): Promise<FinishResult['offcuts']> {
  const { shopId, planId, userId, planName } = scope;
  const created: FinishResult['offcuts'] = [];
  for (const o of rack) {
    const [row] = await tx
      .insert(offcuts)
      .values({
        shopId,
        material: o.material,
        thickness: o.thickness,
        length: o.length,
        width: o.width,
        grain: o.grain,
        status: 'available',
        location: o.location,
        sourcePlanId: planId,
        sourcePiece: String(o.piece + 1),
        costCents: o.costCents,
      })
      .returning({ id: offcuts.id });
    await tx.insert(stockMovements).values({
      shopId,
      kind: 'offcut-created',
      offcutId: row.id,
      quantity: 1,
      planId,
      userId,
      reason: `From piece ${o.piece + 1} of plan “${planName}”`,
    });
    created.push({ id: row.id, length: o.length, width: o.width, location: o.location });
  }
  return created;
}

/**
 * Damaged parts marked on their placement rows (their area counts as spoiled, not yield), then each piece's part and
 * spoiled area kept for the reports, so they need not read every placement.
 */
async function markDamagedPlacements(tx: Tx, shopId: string, planId: string, plan: Plan, damaged: FinishOutcome['damaged']): Promise<void> {
  await writePieceRows(tx, shopId, planId, plan);
  for (const d of damaged) {
    const [pieceRow] = await tx
      .select({ id: planPieces.id })
      .from(planPieces)
      .where(and(eq(planPieces.planId, planId), eq(planPieces.index, d.piece)));
    // A placement's position is unique on its piece, and needs no part row (a typed part id may not be a uuid).
    if (pieceRow) {
      await tx
        .update(placements)
        .set({ damaged: true })
        .where(and(eq(placements.planPieceId, pieceRow.id), eq(placements.instance, d.instance), eq(placements.x, d.x), eq(placements.y, d.y)));
    }
  }
  await tx.execute(sql`
    update plan_pieces pp set
      part_area_mm2 = coalesce((select sum(pl.length_mm * pl.width_mm) from placements pl where pl.plan_piece_id = pp.id and not pl.damaged), 0),
      spoiled_area_mm2 = coalesce((select sum(pl.length_mm * pl.width_mm) from placements pl where pl.plan_piece_id = pp.id and pl.damaged), 0)
     where pp.plan_id = ${planId}`);
}
