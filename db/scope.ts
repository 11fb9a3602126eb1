import type { Db } from './open';

/**
 * Who a query acts for. Every query of `db/queries` that belongs to one shop takes one of these first: the database
 * (or the transaction) to use, the shop whose rows it may see, and for a write the user it records as the actor.
 * A route handler gets its `scope` from the session; a page builds it with `scopeOf(db, user)`.
 */
export interface ShopScope {
  db: Db;
  shopId: string;
}

/** A write made by a person of the shop: the audit trail and the stock ledger name them. */
export interface Scope extends ShopScope {
  userId: string;
}

/** A write the seed or a scheduler may make for no one in particular (its records carry no user). */
export interface SystemScope extends ShopScope {
  userId: string | null;
}

export function scopeOf(db: Db, user: { shopId: string; id: string }): Scope {
  return { db, shopId: user.shopId, userId: user.id };
}
