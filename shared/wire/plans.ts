import type { JobStatus } from '@/shared/schemas/job';
import type { MissingPiece } from '@/shared/schemas/stock';

export type PlanStatus = 'draft' | 'released' | 'cutting' | 'done' | 'cancelled';

/** A plan in its job's list. */
export interface JobPlanSummary {
  id: string;
  name: string;
  status: PlanStatus;
  /** Nested from the job's re-cuts. */
  recutPlan: boolean;
  yieldRatio: number | null;
  costCents: number | null;
  pieces: number;
  unplaced: number;
  createdAt: string;
  updatedAt: string;
}

/** A saw-order step: which stock piece (0-based, as in the plan document) and which step on it (its `n`). */
export interface StepRef {
  piece: number;
  step: number;
}

/** A step ticked done, who and when. */
export interface StepTick extends StepRef {
  doneAt: string;
  doneBy: string | null;
}

export interface PlanTicks {
  status: PlanStatus;
  ticks: StepTick[];
}

/** A finished plan in the owner's yield ledger. */
export interface YieldLedgerRow {
  id: string;
  name: string;
  jobId: string;
  jobName: string;
  yieldRatio: number | null;
  wasteRatio: number | null;
  spoiledRatio: number;
  sawWasteRatio: number | null;
  recutPlan: boolean;
  costCents: number | null;
  finishedAt: Date | null;
  updatedAt: Date;
  finishedBy: string | null;
  offcutsRacked: number;
  stockArea: number;
}

export interface YieldLedger {
  plans: YieldLedgerRow[];
  /** Ratios weighted by stock area: a plan of twenty sheets counts for more than an offcut job. */
  totals: {
    stockArea: number;
    yieldRatio: number | null;
    wasteRatio: number | null;
    sawWasteRatio: number | null;
    spoiledRatio: number | null;
    costCents: number;
  };
}

/** A saved plan as `GET /api/plans/:id` answers it (and as the bench's page hands it over): read by `lib/nesting` on arrival. */
export interface PlanDetail {
  id: string;
  jobId: string;
  name: string;
  status: PlanStatus;
  yieldRatio: number | null;
  costCents: number | null;
  createdAt: string;
  updatedAt: string;
  /** The `NestRequest` it was nested from and the `Plan` document, parsed by the screen with their schemas. */
  request: unknown;
  document: unknown;
}

/** What the Layout bench needs of a saved plan (the page reads it on the server; the bench asks again after a save). */
export type PlanForBench = Pick<PlanDetail, 'id' | 'status' | 'updatedAt' | 'request' | 'document'>;

/** A plan written: its id and the moment it was stored (a later save sends it back to refuse a stale edit). */
export interface PlanSaved {
  id: string;
  updatedAt: string;
}

/** An edited draft stored, with its figures worked out again. */
export interface PlanUpdated extends PlanSaved {
  yieldRatio: number | null;
  costCents: number | null;
}

/** A plan released: the stock it reserved, and what must be bought first. */
export interface ReleaseResult {
  planId: string;
  reserved: { stockId: string; count: number }[];
  toBuy: { stockId: string; count: number }[];
  jobStatus: JobStatus | null;
}

/** A release refused (409): the pieces that are gone, and the Nest screen to plan again against what is left. */
export interface StockShortage {
  error: string;
  missing: MissingPiece[];
  renest: string;
}

/** A plan cancelled: the reservations it gave back. */
export interface PlanCancelled {
  planId: string;
  released: { items: { id: string; count: number }[]; offcuts: string[] };
  jobStatus: JobStatus | null;
}

/** A plan finished at the saw: offcuts racked, yield and waste, re-cuts for damaged parts. */
export interface FinishResult {
  planId: string;
  jobId: string;
  yieldRatio: number;
  /** All waste, spoiled parts included. */
  wasteRatio: number;
  /** Of which parts damaged at the saw. */
  spoiledRatio: number;
  costCents: number;
  offcuts: { id: string; length: number; width: number; location: string }[];
  damaged: number;
  /** Re-cuts put on the job's list for the damaged parts. */
  recutsAdded: number;
  /** Re-cuts this (re-cut) plan cut. */
  recutsClosed: number;
  jobStatus: JobStatus | null;
}
