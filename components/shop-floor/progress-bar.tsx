export function ProgressBar({ done, total, label }: { done: number; total: number; label: string }) {
  const pct = total > 0 ? Math.round((done / total) * 100) : 0;
  return (
    <div>
      <div className="mb-1 flex justify-between text-sm text-graphite-soft">
        <span>{label}</span>
        <span className="font-mono">{pct} %</span>
      </div>
      <div
        className="h-2.5 overflow-hidden rounded-full bg-paper-deep"
        role="progressbar"
        aria-valuemin={0}
        aria-valuemax={total}
        aria-valuenow={done}
        aria-label={label}
      >
        <div className={`h-full rounded-full ${done === total && total > 0 ? 'bg-sage' : 'bg-oak'}`} style={{ width: `${pct}%` }} />
      </div>
    </div>
  );
}
