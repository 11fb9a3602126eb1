import { StatusBadge, type Tone } from '@/components/ui/status-badge';
import type { QuoteRevisionStatus } from '@/shared/schemas/quote';

const LABEL: Record<QuoteRevisionStatus, string> = {
  draft: 'Draft',
  sent: 'Sent',
  replaced: 'Replaced by a newer revision',
  accepted: 'Accepted',
  declined: 'Declined',
  expired: 'Expired',
};
const TONE: Record<QuoteRevisionStatus, Tone> = {
  draft: 'neutral',
  sent: 'accent',
  replaced: 'neutral',
  accepted: 'good',
  declined: 'neutral',
  expired: 'neutral',
};

export function QuoteStatusBadge({ status, depositPaid = false }: { status: QuoteRevisionStatus; depositPaid?: boolean }) {
  if (status === 'accepted' && depositPaid) return <StatusBadge tone="good">Accepted · deposit paid</StatusBadge>;
  return <StatusBadge tone={TONE[status]}>{LABEL[status]}</StatusBadge>;
}
