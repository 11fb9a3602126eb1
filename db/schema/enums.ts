import { pgEnum } from 'drizzle-orm/pg-core';

export const roleEnum = pgEnum('role', ['owner', 'estimator', 'cutter']);
export const jobStatusEnum = pgEnum('job_status', [
  'quoting',
  'quoted',
  'accepted',
  'deposit-paid',
  'cutting',
  'done',
  'declined',
  'expired',
  'archived',
]);
export const grainRuleEnum = pgEnum('grain_rule', ['along-length', 'any']);
export const stockGrainEnum = pgEnum('stock_grain', ['along-length', 'none']);
export const stockKindEnum = pgEnum('stock_kind', ['sheet', 'board']);
export const offcutStatusEnum = pgEnum('offcut_status', ['available', 'reserved', 'used', 'scrapped']);
export const planStatusEnum = pgEnum('plan_status', ['draft', 'released', 'cutting', 'done', 'cancelled']);
export const movementKindEnum = pgEnum('movement_kind', ['received', 'reserved', 'released', 'consumed', 'offcut-created', 'scrapped', 'adjusted']);
/**
 * A quote revision: a draft being priced, sent to the customer, replaced by a newer revision that was sent, or
 * answered by the customer (accepted or declined), or expired unanswered past its validity.
 */
export const quoteRevisionStatusEnum = pgEnum('quote_revision_status', ['draft', 'sent', 'replaced', 'accepted', 'declined', 'expired']);
/** A deposit's payment: a checkout opened, paid, expired unpaid, or refunded after it was paid. */
export const paymentStatusEnum = pgEnum('payment_status', ['open', 'paid', 'expired', 'refunded']);
/** A damaged part's re-cut: open (to nest) → planned (in a released re-cut plan) → cut (that plan finished), or
 * spoiled (damaged again; a new re-cut replaces it), or cancelled by the estimator or owner with a reason. */
export const recutStatusEnum = pgEnum('recut_status', ['open', 'planned', 'cut', 'spoiled', 'cancelled']);
/** A purchase order: draft (lines editable) → sent → part-received → received, or cancelled. */
export const purchaseOrderStatusEnum = pgEnum('purchase_order_status', ['draft', 'sent', 'part-received', 'received', 'cancelled']);
