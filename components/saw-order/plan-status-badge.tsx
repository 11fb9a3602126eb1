import { StatusBadge, type Tone } from '@/components/ui/status-badge';

const STATUS: Record<string, { tone: Tone; label: string }> = {
  draft: { tone: 'neutral', label: 'Draft' },
  released: { tone: 'accent', label: 'Released' },
  cutting: { tone: 'warn', label: 'Cutting' },
  done: { tone: 'good', label: 'Done' },
  cancelled: { tone: 'bad', label: 'Cancelled' },
};

export function PlanStatusBadge({ status }: { status: string }) {
  const s = STATUS[status] ?? { tone: 'neutral' as Tone, label: status };
  return <StatusBadge tone={s.tone}>{s.label}</StatusBadge>;
}
