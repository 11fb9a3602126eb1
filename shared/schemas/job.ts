import { z } from 'zod';

export const JOB_STATUSES = ['quoting', 'won', 'cutting', 'done', 'archived'] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

export const JOB_STATUS_LABELS: Record<JobStatus, string> = {
  quoting: 'Quoting',
  won: 'Won',
  cutting: 'Cutting',
  done: 'Done',
  archived: 'Archived',
};

export const jobInputSchema = z.object({
  name: z.string().trim().min(1, 'Give the job a name.').max(120, 'Keep the name under 120 characters.'),
  customer: z.string().trim().max(120, 'Keep the customer under 120 characters.').default(''),
  status: z.enum(JOB_STATUSES).default('quoting'),
  dueDate: z.iso.date({ error: 'Use a date like 2027-01-31.' }).nullable().default(null),
  notes: z.string().max(4000, 'Keep notes under 4,000 characters.').default(''),
});
export type JobInput = z.infer<typeof jobInputSchema>;

export const jobPatchSchema = jobInputSchema.partial();
export type JobPatch = z.infer<typeof jobPatchSchema>;

export interface JobSummary {
  id: string;
  name: string;
  customer: string;
  status: JobStatus;
  dueDate: string | null;
  notes: string;
  partCount: number;
  materials: string[];
  createdAt: string;
  updatedAt: string;
}
