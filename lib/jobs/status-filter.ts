import { JOB_STATUS_LABELS, JOB_STATUSES, type JobStatus } from '@/shared/schemas/job';

/**
 * The jobs list's status filter: by default ('' in the URL) every job still in play, archived ones left out; one
 * status; or `all`, archived included.
 */
export type JobStatusFilter = '' | 'all' | JobStatus;

export const JOB_STATUS_FILTERS: { value: JobStatusFilter; label: string }[] = [
  { value: '', label: 'Open (not archived)' },
  ...JOB_STATUSES.map((s) => ({ value: s as JobStatusFilter, label: JOB_STATUS_LABELS[s] })),
  { value: 'all', label: 'Any, archived too' },
];

export function readStatusFilter(value: string | null): JobStatusFilter {
  return JOB_STATUS_FILTERS.some((f) => f.value === value) ? (value as JobStatusFilter) : '';
}

export function jobInStatusFilter(status: JobStatus, filter: JobStatusFilter): boolean {
  if (filter === 'all') return true;
  if (filter === '') return status !== 'archived';
  return status === filter;
}
