import type { ShopUnits } from '@/shared/schemas/units';
import { DEFAULT_PRICING, type PricingSettings } from '@/shared/schemas/pricing';
import { doublePrecision, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

export const shops = pgTable('shops', {
  id: uuid('id').primaryKey().defaultRandom(),
  name: text('name').notNull(),
  units: jsonb('units').$type<ShopUnits>().notNull().default({ system: 'imperial', precision: 16, feet: false }),
  currency: text('currency').notNull().default('USD'),
  kerf: doublePrecision('kerf_mm').notNull().default(3.2),
  edgeTrim: doublePrecision('edge_trim_mm').notNull().default(10),
  minOffcutLength: doublePrecision('min_offcut_length_mm').notNull().default(300),
  minOffcutWidth: doublePrecision('min_offcut_width_mm').notNull().default(100),
  /** The narrowest strip a rip may leave between blade and fence (1″ by default, common practice, no source). */
  minFenceWidth: doublePrecision('min_fence_width_mm').notNull().default(25.4),
  /** Waste allowance used by takeoffs, in whole percent. */
  wastePercent: integer('waste_percent').notNull().default(15),
  /** IANA time zone: every date shown, grouped and exported is in the shop's own zone. */
  timeZone: text('time_zone').notNull().default('UTC'),
  /** The yield the owner aims for, in whole percent of stock area (the target line on the yield report). */
  yieldTargetPercent: integer('yield_target_percent').notNull().default(75),
  /** Offcuts racked longer than this many months are listed to use or scrap. */
  offcutAgeMonths: integer('offcut_age_months').notNull().default(6),
  /** Rates, labour minutes, markups, tax, deposit, validity and terms every new quote starts from. */
  pricing: jsonb('pricing').$type<PricingSettings>().notNull().default(DEFAULT_PRICING),
  /** Address, phone and anything else printed under the shop's name on its purchase orders. */
  purchaseOrderDetails: text('purchase_order_details').notNull().default(''),
  /** The shop's local time (HH:MM) the low-stock digest goes to the owners; '' sends none. */
  lowStockDigestTime: text('low_stock_digest_time').notNull().default('07:00'),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});
