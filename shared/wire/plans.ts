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
