import type { JobSummary } from '@/shared/schemas/job';

/** The jobs list's search: a job matches when its name, customer or one of its materials holds the text (any case). */
export function jobMatchesSearch(job: Pick<JobSummary, 'name' | 'customer' | 'materials'>, needle: string): boolean {
  const text = needle.trim().toLowerCase();
  if (!text) return true;
  return [job.name, job.customer, ...job.materials].some((field) => field.toLowerCase().includes(text));
}
