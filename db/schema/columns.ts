import { uuid } from 'drizzle-orm/pg-core';
import { shops } from './shops';

/** The tenant column every shop-owned table carries; rows go with their shop. */
export const shopIdColumn = () =>
  uuid('shop_id')
    .notNull()
    .references(() => shops.id, { onDelete: 'cascade' });
