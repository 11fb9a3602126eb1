import type { DrawerSchedule } from '@/shared/schemas/drawer-schedule';
import type { CutListField } from '@/shared/schemas/cut-list-upload';
import type { Customer } from '@/shared/schemas/customer';
import type { JobStatus } from '@/shared/schemas/job';
import type { Part, PartInput } from '@/shared/schemas/part';

/** A row of a job's cut list, with the drawer schedule that owns it (null for a typed or uploaded row). */
export type ListedPart = Part & { schedule: string | null };

/** A job in its customer's list. */
export interface CustomerJob {
  id: string;
  name: string;
  status: JobStatus;
  dueDate: string | null;
  updatedAt: string;
}

export type CustomerWithJobs = Customer & { jobs: CustomerJob[] };

/** A drawer schedule of a job, with the inputs it was made from. */
export interface SavedDrawerSchedule {
  id: string;
  jobId: string;
  label: string;
  input: DrawerSchedule;
  /** Cut-list rows it holds now. */
  partRows: number;
  updatedAt: string;
}

/** What is wrong with an uploaded row: a cell (by its field) or the row as a whole. */
export interface RowProblem {
  field: CutListField | 'row';
  message: string;
}

/** An uploaded row, read: the part it makes, or its problems. */
export type UploadRowResult = { line: number; ok: true; part: PartInput } | { line: number; ok: false; problems: RowProblem[] };

/** An upload checked row by row (nothing written), with warnings about the stock room. */
export interface CutListPreview {
  rows: UploadRowResult[];
  validCount: number;
  invalidCount: number;
  warnings: { line: number; message: string }[];
}

/** An upload written: how many rows went in and which lines were left out. */
export interface CutListImported {
  imported: number;
  skipped: number;
  skippedLines: number[];
}
