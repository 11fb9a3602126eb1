import type { ReactNode } from 'react';

/** One headline figure (value, cost, yield) with its label and an optional line of detail. */
export function FigureCard({
  label,
  value,
  detail,
  tone = '',
  testId,
}: {
  label: string;
  value: ReactNode;
  detail?: ReactNode;
  tone?: string;
  testId?: string;
}) {
  return (
    <div className="card p-4" data-testid={testId}>
      <div className="text-xs uppercase tracking-wide text-graphite-mute">{label}</div>
      <div className={`num text-left text-2xl font-semibold ${tone}`}>{value}</div>
      {detail && <div className="text-xs text-graphite-mute">{detail}</div>}
    </div>
  );
}
