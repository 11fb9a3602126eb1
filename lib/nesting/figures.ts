/** Figures of a plan: per stock piece (yield, waste, cuts, cost) and for the whole plan (totals, stock to pull/buy). */
import { area, type Rect } from '@/lib/geometry/rect';
import type { NestStock, PieceFigures, PlanPiece, PlanTotals, StockLine } from '@/shared/schemas/nesting';

const sum = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0);

/** Yield = part area / stock area of the whole piece (trim and kerf count as waste). */
export function pieceFigures(
  piece: Pick<PlanPiece, 'length' | 'width' | 'placements' | 'sawOrder'>,
  offcuts: readonly Rect[],
  costEach: number,
): PieceFigures {
  const stockArea = piece.length * piece.width;
  const partArea = sum(piece.placements.map(area));
  const offcutArea = sum(offcuts.map(area));
  const steps = piece.sawOrder ?? [];
  return {
    stockArea,
    partArea,
    offcutArea,
    wasteArea: Math.max(0, stockArea - partArea - offcutArea),
    yield: stockArea > 0 ? partArea / stockArea : 0,
    cuts: steps.length,
    cutLength: sum(steps.map((s) => s.length)),
    cost: costEach,
  };
}

/** Totals over the pieces that carry figures (all of them, once cuts are rebuilt). */
export function planTotals(pieces: readonly PlanPiece[]): PlanTotals {
  const figures = pieces.flatMap((p) => (p.figures ? [p.figures] : []));
  const total = (k: keyof PieceFigures) => sum(figures.map((f) => f[k]));
  const byMaterial = new Map<string, PlanTotals['byMaterial'][number]>();
  for (const p of pieces) {
    const key = `${p.material}\u0000${p.thickness}\u0000${p.kind}`;
    const row = byMaterial.get(key) ?? { material: p.material, thickness: p.thickness, kind: p.kind, pieces: 0 };
    row.pieces++;
    byMaterial.set(key, row);
  }
  const stockArea = total('stockArea');
  const partArea = total('partArea');
  return {
    byMaterial: [...byMaterial.values()],
    pieces: pieces.length,
    stockArea,
    partArea,
    offcutArea: total('offcutArea'),
    wasteArea: total('wasteArea'),
    yield: stockArea > 0 ? partArea / stockArea : 0,
    cost: total('cost'),
    cuts: total('cuts'),
    cutLength: total('cutLength'),
  };
}

/** What to take from the rack (stock on hand and offcuts) and what to buy (sizes with no count). */
export function stockLines(pieces: readonly PlanPiece[], stock: readonly NestStock[]): { stockToPull: StockLine[]; stockToBuy: StockLine[] } {
  const used = new Map<string, number>();
  for (const p of pieces) used.set(p.stockId, (used.get(p.stockId) ?? 0) + 1);
  const stockToPull: StockLine[] = [];
  const stockToBuy: StockLine[] = [];
  for (const s of stock) {
    const count = used.get(s.id);
    if (!count) continue;
    const line: StockLine = {
      stockId: s.id,
      kind: s.kind,
      material: s.material,
      thickness: s.thickness,
      length: s.length,
      width: s.width,
      count,
      costEach: s.costEach,
      cost: count * s.costEach,
      ...(s.source ? { source: s.source } : {}),
    };
    (s.count === null ? stockToBuy : stockToPull).push(line);
  }
  return { stockToPull, stockToBuy };
}
