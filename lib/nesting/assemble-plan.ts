/** Builds plan pieces from placements and a cut tree: trim cuts, saw order, leftovers, figures; then the plan. */
import { requestSaws } from '@/lib/nesting/saw-profile';
import type { CutNode } from '@/lib/nesting/pack/types';
import { treeLeaves } from '@/lib/nesting/guillotine';
import { withTrimCuts } from '@/lib/nesting/cut-tree';
import { isKeepable, sawOrderFromTree, stockPieceName } from '@/lib/nesting/saw-order';
import { pieceFigures, planTotals, stockLines } from '@/lib/nesting/figures';
import { stockRect, trimFor, usableRect } from '@/lib/nesting/stock-rules';
import {
  PLAN_VERSION,
  type NestRequest,
  type NestStock,
  type Placement,
  type Plan,
  type PlanPiece,
  type Unplaced,
} from '@/shared/schemas/nesting';

/**
 * One stock piece of the plan. `innerTree` cuts the usable (trimmed) area, in stock coordinates, its item leaves
 * numbered by placement index; null when the layout cannot be cut (the piece then has no tree, saw order or figures,
 * and `validatePlan` says why).
 */
export function assemblePiece(stock: NestStock, index: number, placements: Placement[], innerTree: CutNode | null, request: NestRequest): PlanPiece {
  const { settings } = request;
  const trim = trimFor(stock, settings);
  const base: PlanPiece = {
    stockId: stock.id,
    kind: stock.kind,
    length: stock.length,
    width: stock.width,
    thickness: stock.thickness,
    material: stock.material,
    trim,
    placements,
  };
  if (!innerTree) return base;
  const tree = withTrimCuts(innerTree, stockRect(stock), trim, settings.kerf);
  const sawOrder = sawOrderFromTree(tree, stockPieceName(index), {
    kerf: settings.kerf,
    usable: usableRect(stock, trim),
    placements,
    minOffcutLength: settings.minOffcutLength,
    minOffcutWidth: settings.minOffcutWidth,
    minFenceWidth: settings.minFenceWidth,
    saws: requestSaws(settings),
  });
  const leftovers = treeLeaves(tree).flatMap((l) => (l.type === 'leftover' && l.rect.w > 0 && l.rect.h > 0 ? [l.rect] : []));
  const offcuts = leftovers.filter((r) => isKeepable(r, settings.minOffcutLength, settings.minOffcutWidth));
  const waste = leftovers.filter((r) => !offcuts.includes(r));
  const piece: PlanPiece = { ...base, tree, sawOrder, offcuts, waste };
  return { ...piece, figures: pieceFigures(piece, offcuts, stock.costEach) };
}

/** The plan around its pieces: totals, stock to pull and to buy. */
export function assemblePlan(request: NestRequest, pieces: PlanPiece[], unplaced: Unplaced[], cancelled = false): Plan {
  return {
    version: PLAN_VERSION,
    pieces,
    unplaced,
    totals: planTotals(pieces),
    ...stockLines(pieces, request.stock),
    cancelled,
  };
}
