import type { StockDetailField } from '@/shared/schemas/stock';

export type StockKind = 'sheet' | 'board';
export type StockGrain = 'along-length' | 'none';
export type OffcutStatus = 'available' | 'reserved' | 'used' | 'scrapped';
export type MovementKind = 'received' | 'reserved' | 'released' | 'consumed' | 'offcut-created' | 'scrapped' | 'adjusted';

/** A size on the rack with what is free of it, whether it is low, and its value at cost. */
export interface StockItemRow {
  id: string;
  shopId: string;
  kind: StockKind;
  material: string;
  nominalThickness: string;
  thickness: number;
  length: number;
  width: number;
  grain: StockGrain;
  surfacing: string;
  grade: string;
  onHand: number;
  reserved: number;
  lowStockAt: number;
  costCents: number;
  supplier: string;
  location: string;
  buyable: boolean;
  createdAt: Date;
  free: number;
  low: boolean;
  valueCents: number;
}

/** An offcut on the rack, with the name of the plan it came from. */
export interface OffcutRow {
  id: string;
  shopId: string;
  material: string;
  thickness: number;
  length: number;
  width: number;
  grain: StockGrain;
  status: OffcutStatus;
  location: string;
  sourcePlanId: string | null;
  sourcePiece: string | null;
  costCents: number;
  createdAt: Date;
  planName: string | null;
}

/** One row of the stock ledger, with who moved it and what it moved. */
export interface MovementRow {
  id: string;
  kind: MovementKind;
  quantity: number;
  reservedChange: number;
  reason: string;
  createdAt: Date;
  stockItemId: string | null;
  offcutId: string | null;
  planId: string | null;
  who: string | null;
  item: string | null;
}

/** A size's details changed (no count moved): field → from and to. */
export type StockDetailChanges = Partial<Record<StockDetailField, { from: unknown; to: unknown }>>;

export interface DetailChange {
  id: string;
  createdAt: Date;
  stockItemId: string | null;
  who: string | null;
  item: string | null;
  changes: StockDetailChanges;
}

/** A size as stored (no figures worked out): what a write of one answers. */
export type StockItemRecord = Omit<StockItemRow, 'free' | 'low' | 'valueCents'>;

/** An offcut as stored: what a write of one answers. */
export type OffcutRecord = Omit<OffcutRow, 'planName'>;

/** A material and thickness the stock room offers (sheets, boards, available offcuts), for pickers; no prices. */
export interface StockOffer {
  material: string;
  kind: 'sheet' | 'board' | 'offcut';
  thickness: number;
  /** What the shop calls the thickness ("3/4\"", "4/4"); empty for offcuts. */
  nominal: string;
}

/** A line of a stock CSV that cannot be read, with every reason. */
export interface StockCsvError {
  line: number;
  messages: string[];
}

/** A stock CSV checked (and written, when asked): how many rows are valid, how many went in, what is wrong. */
export interface StockImportResult {
  valid: number;
  imported: number;
  errors: StockCsvError[];
}

/** The sheets and boards on the rack; their value only for those who may see prices. */
export interface StockList {
  items: StockItemRow[];
  value?: { stockCents: number; offcutCents: number; totalCents: number };
}
