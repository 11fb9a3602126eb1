import { sql } from 'drizzle-orm';
import { check, index, integer, pgTable, text, timestamp, uniqueIndex, uuid, primaryKey } from 'drizzle-orm/pg-core';
import { purchaseOrderStatusEnum } from './enums';
import { shopIdColumn } from './columns';
import { plans } from './plans';
import { stockItems } from './stock';
import { users } from './users';
import { mailOutbox } from './mail';

/**
 * A supplier's contact, keyed by the name the stock room writes on its sizes (`stock_items.supplier`), so a
 * purchase order knows where to send itself. One row per name per shop (case aside).
 */
export const suppliers = pgTable(
  'suppliers',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    name: text('name').notNull(),
    email: text('email').notNull().default(''),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('suppliers_shop_name_key').on(t.shopId, sql`lower(${t.name})`)],
);

/**
 * What the shop orders from one supplier, numbered per shop (PO-0001): draft (lines editable) → sent (by e-mail
 * through the outbox) → part-received → received, or cancelled before anything arrived.
 */
export const purchaseOrders = pgTable(
  'purchase_orders',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    number: integer('number').notNull(),
    supplier: text('supplier').notNull(),
    /** Where it is sent: the supplier's address when it was made, editable while a draft. */
    supplierEmail: text('supplier_email').notNull().default(''),
    status: purchaseOrderStatusEnum('status').notNull().default('draft'),
    /** What it was made from: 'plan' (a plan's stock to buy), 'low-stock', or 'manual'. */
    source: text('source').notNull().default('manual'),
    planId: uuid('plan_id').references(() => plans.id, { onDelete: 'set null' }),
    currency: text('currency').notNull(),
    note: text('note').notNull().default(''),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    receivedAt: timestamp('received_at', { withTimezone: true }),
    cancelledAt: timestamp('cancelled_at', { withTimezone: true }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('purchase_orders_shop_number_key').on(t.shopId, t.number),
    index('purchase_orders_shop_status_idx').on(t.shopId, t.status),
    check('purchase_orders_source_check', sql`${t.source} in ('plan', 'low-stock', 'manual')`),
  ],
);

/** One stock size on a purchase order: how many, at what unit cost (the stock room's: each sheet, or per board foot). */
export const purchaseOrderLines = pgTable(
  'purchase_order_lines',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    purchaseOrderId: uuid('purchase_order_id')
      .notNull()
      .references(() => purchaseOrders.id, { onDelete: 'cascade' }),
    stockItemId: uuid('stock_item_id')
      .notNull()
      .references(() => stockItems.id, { onDelete: 'cascade' }),
    position: integer('position').notNull().default(0),
    quantity: integer('quantity').notNull(),
    unitCostCents: integer('unit_cost_cents').notNull(),
    received: integer('received').notNull().default(0),
  },
  (t) => [
    uniqueIndex('purchase_order_lines_order_item_key').on(t.purchaseOrderId, t.stockItemId),
    index('purchase_order_lines_item_idx').on(t.shopId, t.stockItemId),
    check('purchase_order_lines_quantity_positive', sql`${t.quantity} > 0 and ${t.quantity} <= 100000`),
    check('purchase_order_lines_cost_nonnegative', sql`${t.unitCostCents} >= 0`),
    check('purchase_order_lines_received_within', sql`${t.received} >= 0 and ${t.received} <= ${t.quantity}`),
  ],
);

/**
 * The low-stock digest's day, one row per shop per local day: written in the same transaction as the digest's mail
 * (or with none when nothing was low), so two app servers never send it twice on one day.
 */
export const lowStockDigests = pgTable(
  'low_stock_digests',
  {
    shopId: shopIdColumn(),
    /** The shop's local day, YYYY-MM-DD. */
    day: text('day').notNull(),
    sizes: integer('sizes').notNull(),
    mailId: uuid('mail_id').references(() => mailOutbox.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.shopId, t.day] })],
);
