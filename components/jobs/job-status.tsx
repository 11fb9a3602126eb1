import { StatusBadge, type Tone } from '@/components/ui/status-badge';
import { JOB_STATUS_LABELS, type JobStatus } from '@/shared/schemas/job';

const TONE: Record<JobStatus, Tone> = {
  quoting: 'accent',
  quoted: 'accent',
  accepted: 'good',
  'deposit-paid': 'good',
  cutting: 'warn',
  done: 'neutral',
  declined: 'neutral',
  expired: 'neutral',
  archived: 'neutral',
};

export function JobStatusBadge({ status }: { status: JobStatus }) {
  return <StatusBadge tone={TONE[status]}>{JOB_STATUS_LABELS[status]}</StatusBadge>;
}
