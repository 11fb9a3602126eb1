import { StatusBadge } from '@/components/ui/status-badge';

const LABEL = { draft: 'Draft', sent: 'Sent', replaced: 'Replaced by a newer revision' } as const;
const TONE = { draft: 'neutral', sent: 'accent', replaced: 'neutral' } as const;

export function QuoteStatusBadge({ status }: { status: keyof typeof LABEL }) {
  return <StatusBadge tone={TONE[status]}>{LABEL[status]}</StatusBadge>;
}
