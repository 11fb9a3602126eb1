import { sql } from 'drizzle-orm';
import { boolean, check, doublePrecision, index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { movementKindEnum, offcutStatusEnum, stockGrainEnum, stockKindEnum } from './enums';
import { shopIdColumn } from './columns';
import { users } from './users';

/** Sheets and boards on the rack. Counts are guarded by the database, not only by code. */
export const stockItems = pgTable(
  'stock_items',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    kind: stockKindEnum('kind').notNull(),
    /** Sheet material ("Baltic birch") or board species ("White oak"). */
    material: text('material').notNull(),
    /** What the shop calls the thickness: "3/4", "18 mm", "4/4". */
    nominalThickness: text('nominal_thickness').notNull(),
    thickness: doublePrecision('thickness_mm').notNull(),
    length: doublePrecision('length_mm').notNull(),
    width: doublePrecision('width_mm').notNull(),
    grain: stockGrainEnum('grain').notNull().default('along-length'),
    /** Boards: rough, S2S, S4S. Empty for sheets. */
    surfacing: text('surfacing').notNull().default(''),
    grade: text('grade').notNull().default(''),
    onHand: integer('on_hand').notNull().default(0),
    reserved: integer('reserved').notNull().default(0),
    lowStockAt: integer('low_stock_at').notNull().default(0),
    /** Sheets: cost each. Boards: cost per board foot. Minor currency units (cents). */
    costCents: integer('cost_cents').notNull().default(0),
    supplier: text('supplier').notNull().default(''),
    location: text('location').notNull().default(''),
    /** The shop can buy more of this size when a plan needs it. */
    buyable: boolean('buyable').notNull().default(false),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('stock_items_shop_idx').on(t.shopId),
    check('stock_on_hand_nonnegative', sql`${t.onHand} >= 0`),
    check('stock_reserved_within_on_hand', sql`${t.reserved} >= 0 and ${t.reserved} <= ${t.onHand}`),
    check('stock_sizes_positive', sql`${t.length} > 0 and ${t.width} > 0 and ${t.thickness} > 0`),
  ],
);

export const offcuts = pgTable(
  'offcuts',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    material: text('material').notNull(),
    thickness: doublePrecision('thickness_mm').notNull(),
    length: doublePrecision('length_mm').notNull(),
    width: doublePrecision('width_mm').notNull(),
    grain: stockGrainEnum('grain').notNull().default('along-length'),
    status: offcutStatusEnum('status').notNull().default('available'),
    location: text('location').notNull().default(''),
    sourcePlanId: uuid('source_plan_id'),
    sourcePiece: text('source_piece'),
    /** Value carried for costing, minor units. */
    costCents: integer('cost_cents').notNull().default(0),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('offcuts_shop_idx').on(t.shopId, t.status),
    check('offcut_sizes_positive', sql`${t.length} > 0 and ${t.width} > 0 and ${t.thickness} > 0`),
    check('offcut_cost_nonnegative', sql`${t.costCents} >= 0`),
  ],
);

export const stockMovements = pgTable(
  'stock_movements',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    kind: movementKindEnum('kind').notNull(),
    stockItemId: uuid('stock_item_id').references(() => stockItems.id, { onDelete: 'cascade' }),
    offcutId: uuid('offcut_id').references(() => offcuts.id, { onDelete: 'cascade' }),
    /** Signed change of the on-hand count (0 for a reservation or its release). */
    quantity: integer('quantity').notNull(),
    /**
     * Signed change of the reserved count: + at release, − when a cancel gives it back, and − on the consumption at
     * done that cuts reserved pieces (one row for one physical change: the pieces leave the rack and their
     * reservation ends with them).
     */
    reservedChange: integer('reserved_change').notNull().default(0),
    planId: uuid('plan_id'),
    /** The purchase order a receipt was received against (null for any other movement). */
    purchaseOrderId: uuid('purchase_order_id'),
    userId: uuid('user_id').references(() => users.id, { onDelete: 'set null' }),
    reason: text('reason').notNull().default(''),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('stock_movements_shop_idx').on(t.shopId, t.createdAt),
    check('stock_movements_target', sql`(${t.stockItemId} is null) <> (${t.offcutId} is null)`),
  ],
);
