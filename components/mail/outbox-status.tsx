import { StatusBadge, type Tone } from '@/components/ui/status-badge';
import type { OutboxStatus } from '@/shared/wire/mail';

const LABEL: Record<OutboxStatus, string> = { pending: 'Waiting', sending: 'Sending', sent: 'Sent', failed: 'Failed' };
const TONE: Record<OutboxStatus, Tone> = { pending: 'warn', sending: 'accent', sent: 'good', failed: 'bad' };

export function OutboxStatusBadge({ status }: { status: OutboxStatus }) {
  return <StatusBadge tone={TONE[status]}>{LABEL[status]}</StatusBadge>;
}

export const MAIL_KIND_LABELS: Record<string, string> = {
  invite: 'Team invite',
  'password-reset': 'Password reset',
  quote: 'Quote',
  'quote-accepted': 'Acceptance',
  'deposit-receipt': 'Deposit receipt',
  'purchase-order': 'Purchase order',
  'low-stock-digest': 'Low-stock digest',
};
