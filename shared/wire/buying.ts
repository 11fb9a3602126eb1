import type { StockKind } from './stock';

export type PurchaseOrderStatus = 'draft' | 'sent' | 'part-received' | 'received' | 'cancelled';

/** A stock size as a purchase order names it (lib/buying/describe.ts writes it out in the shop's unit). */
export interface DescribedSize {
  kind: StockKind;
  material: string;
  nominalThickness: string;
  thickness: number;
  length: number;
  width: number;
  surfacing: string;
  grade: string;
}

/** A line of an order: the stock size it is for and its figures. */
export interface PurchaseOrderLineView extends DescribedSize {
  id: string;
  stockItemId: string;
  /** The stock room's cost now (each, or per board foot), to compare with the order's. */
  stockCostCents: number;
  onHand: number;
  quantity: number;
  /** Each sheet, or per board foot for boards. */
  unitCostCents: number;
  /** One piece at this order's unit cost (a board: its board feet × the price). */
  costEachCents: number;
  totalCents: number;
  received: number;
}

/** A purchase order with its lines, what has arrived and its total. */
export interface PurchaseOrderView {
  id: string;
  number: number;
  title: string;
  supplier: string;
  supplierEmail: string;
  status: PurchaseOrderStatus;
  source: 'plan' | 'low-stock' | 'manual';
  planId: string | null;
  planName: string | null;
  jobId: string | null;
  currency: string;
  note: string;
  sentAt: string | null;
  receivedAt: string | null;
  cancelledAt: string | null;
  createdAt: string;
  updatedAt: string;
  lines: PurchaseOrderLineView[];
  totalCents: number;
}

/** Drafts made at once (one per supplier). */
export interface PurchaseOrdersMade {
  orders: PurchaseOrderView[];
}
