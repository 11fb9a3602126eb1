import { z } from 'zod';
import { text } from './text';

export const JOB_STATUSES = ['quoting', 'quoted', 'accepted', 'deposit-paid', 'cutting', 'done', 'declined', 'expired', 'archived'] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

export const JOB_STATUS_LABELS: Record<JobStatus, string> = {
  quoting: 'Quoting',
  quoted: 'Quoted',
  accepted: 'Accepted',
  'deposit-paid': 'Deposit paid',
  cutting: 'Cutting',
  done: 'Done',
  declined: 'Declined',
  expired: 'Expired',
  archived: 'Archived',
};

/** Each field of a job, checked the same on the server and in the forms. */
export const jobFields = {
  name: text().min(1, 'Give the job a name.').max(120, 'Keep the name under 120 characters.'),
  /**
   * Who the job is for: one of the shop's customers by id, or a name (the shop's customer of that name, or a new one;
   * a plain string is read as a name), or null / an empty name for none.
   */
  customer: z
    .union(
      [
        z.object({ id: z.uuid({ error: 'Pick one of the shop’s customers.' }) }),
        z.object({ name: text().max(120, 'Keep the customer’s name under 120 characters.') }),
        text().max(120, 'Keep the customer’s name under 120 characters.'),
        z.null(),
      ],
      { error: 'Pick a customer or type a new one’s name.' },
    )
    .transform((v): { id: string } | { name: string } | null => {
      const named = typeof v === 'string' ? { name: v } : v;
      return named && 'name' in named && !named.name ? null : named;
    }),
  status: z.enum(JOB_STATUSES, { error: `Status is one of ${JOB_STATUSES.join(', ')}.` }),
  dueDate: z.iso.date({ error: 'Use a date like 2027-01-31.' }).nullable(),
  notes: text({ multiline: true }).max(4000, 'Keep notes under 4,000 characters.'),
};

/** A new job starts as a quote, or as accepted when the work is already agreed; cutting and done follow its plans. */
export const jobInputSchema = z.object({
  name: jobFields.name,
  customer: jobFields.customer.default(null),
  status: z.enum(['quoting', 'accepted'], { error: 'A new job is quoting or accepted; cutting and done follow its plans.' }).default('quoting'),
  dueDate: jobFields.dueDate.default(null),
  notes: jobFields.notes.default(''),
});
export type JobInput = z.infer<typeof jobInputSchema>;

/**
 * A change to a job: only the fields sent change (no defaults here, so changing the status leaves the notes alone).
 * Which statuses a person may set by hand is decided with the job's plans (lib/jobs/status.ts).
 */
export const jobPatchSchema = z.strictObject({
  name: jobFields.name.optional(),
  customer: jobFields.customer.optional(),
  status: jobFields.status.optional(),
  dueDate: jobFields.dueDate.optional(),
  notes: jobFields.notes.optional(),
});
export type JobPatch = z.infer<typeof jobPatchSchema>;

export interface JobSummary {
  id: string;
  name: string;
  /** The customer's name ('' for none), and who it is. */
  customer: string;
  customerId: string | null;
  status: JobStatus;
  dueDate: string | null;
  notes: string;
  /** ISO time the job was marked accepted, or null. */
  acceptedAt: string | null;
  partCount: number;
  materials: string[];
  createdAt: string;
  updatedAt: string;
}
