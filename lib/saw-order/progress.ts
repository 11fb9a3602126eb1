/** How far the saw has got: per stock piece, which steps are ticked and which comes next. */
import type { PlanPiece } from '@/shared/schemas/nesting';
import type { StepRef } from '@/shared/wire/plans';

export interface PieceProgress {
  piece: number;
  total: number;
  done: number;
  /** The first step not ticked yet (steps may be ticked out of order), or null when the piece is finished. */
  next: number | null;
  ticked: Set<number>;
}

export function sawProgress(pieces: readonly Pick<PlanPiece, 'sawOrder'>[], ticks: readonly StepRef[]) {
  const byPiece: PieceProgress[] = pieces.map((p, piece) => {
    const steps = (p.sawOrder ?? []).map((s) => s.n);
    const ticked = new Set(ticks.filter((t) => t.piece === piece && steps.includes(t.step)).map((t) => t.step));
    return { piece, total: steps.length, done: ticked.size, next: steps.find((n) => !ticked.has(n)) ?? null, ticked };
  });
  const total = byPiece.reduce((s, p) => s + p.total, 0);
  const done = byPiece.reduce((s, p) => s + p.done, 0);
  return { pieces: byPiece, total, done, finished: total > 0 && done === total };
}
