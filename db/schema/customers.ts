import { index, integer, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './columns';

/** A shop's customers: the people and firms its jobs are for. */
export const customers = pgTable(
  'customers',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    name: text('name').notNull(),
    company: text('company').notNull().default(''),
    email: text('email').notNull().default(''),
    phone: text('phone').notNull().default(''),
    billingAddress: text('billing_address').notNull().default(''),
    siteAddress: text('site_address').notNull().default(''),
    notes: text('notes').notNull().default(''),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('customers_shop_idx').on(t.shopId)],
);

/** The shop's hardware price list (Shop settings → Pricing): what quotes pick hardware lines from. */
export const hardwareItems = pgTable(
  'hardware_items',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    name: text('name').notNull(),
    unit: text('unit').notNull(),
    /** Price of one unit in the shop currency's minor units. */
    priceMinor: integer('price_minor').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('hardware_items_shop_name_idx').on(t.shopId, t.name)],
);
