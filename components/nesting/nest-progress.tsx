'use client';

import type { NestProgress } from '@/lib/nesting/worker-api';
import { countOf } from '@/lib/plural';

/** The running Nest: time used of the budget, and the best plan found so far. */
export function NestProgressBar({
  progress,
  budgetMs,
  label,
  onCancel,
}: {
  progress: NestProgress | null;
  budgetMs: number;
  label: string;
  onCancel: () => void;
}) {
  const elapsed = progress?.elapsedMs ?? 0;
  const share = budgetMs > 0 ? Math.min(1, elapsed / budgetMs) : 0;
  return (
    <div className="card flex flex-wrap items-center gap-4 p-4" role="status" aria-live="polite" data-testid="nest-progress">
      <div className="min-w-64 flex-1">
        <div className="mb-1 flex justify-between text-sm">
          <span className="font-medium">{label}</span>
          <span className="num text-graphite-mute">
            {(elapsed / 1000).toFixed(1)} s of {(budgetMs / 1000).toFixed(0)} s
          </span>
        </div>
        <div
          className="h-2 overflow-hidden rounded-full bg-paper-deep"
          role="progressbar"
          aria-label="Nest progress"
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={Math.round(share * 100)}
        >
          <div className="h-full rounded-full bg-oak transition-[width] duration-100" style={{ width: `${share * 100}%` }} />
        </div>
        <p className="mt-1 text-sm text-graphite-soft" data-testid="nest-best">
          {progress && progress.piecesUsed > 0 ? (
            <>
              Best plan so far, every material and offcut counted: <strong>{countOf(progress.piecesUsed, 'piece')}</strong> of stock,{' '}
              <strong>{(progress.yield * 100).toFixed(1)} %</strong> yield
            </>
          ) : (
            'Looking for a first plan…'
          )}
        </p>
      </div>
      <button type="button" className="btn-quiet" onClick={onCancel}>
        Stop and keep the best
      </button>
    </div>
  );
}
