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
  thicknessMm: number;
  lengthMm: number;
  widthMm: number;
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
  thicknessMm: number;
  lengthMm: number;
  widthMm: number;
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
