import { StatusBadge, type Tone } from '@/components/ui/status-badge';
import { PO_STATUS_LABELS, type PoStatus } from '@/lib/buying/describe';

const TONE: Record<PoStatus, Tone> = { draft: 'neutral', sent: 'accent', 'part-received': 'warn', received: 'good', cancelled: 'bad' };

export function PoStatusBadge({ status }: { status: PoStatus }) {
  return <StatusBadge tone={TONE[status]}>{PO_STATUS_LABELS[status]}</StatusBadge>;
}
