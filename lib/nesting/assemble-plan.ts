/** Builds plan pieces from placements and a cut tree: trim cuts, saw order, leftovers, figures; then the plan. */
import { cutProblems, requestSaws } from '@/lib/nesting/saw-profile';
import { replaySawOrder } from '@/lib/nesting/saw-order';
import type { Rect } from '@/lib/geometry/rect';
import type { NestSaw } from '@/shared/schemas/saw';
import type { CutNode } from '@/lib/nesting/pack/types';
import { treeLeaves } from '@/lib/nesting/guillotine';
import { withStripEndTrims, withTrimCuts, withTrimsOnStrips } from '@/lib/nesting/cut-tree';
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
  type SawStep,
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
  const saws = requestSaws(settings);
  const order = (t: CutNode) =>
    sawOrderFromTree(t, stockPieceName(index), {
      kerf: settings.kerf,
      usable: usableRect(stock, trim),
      placements,
      minOffcutLength: settings.minOffcutLength,
      minOffcutWidth: settings.minOffcutWidth,
      minFenceWidth: settings.minFenceWidth,
      saws,
    });
  let tree = withTrimCuts(innerTree, stockRect(stock), trim, settings.kerf);
  let sawOrder = order(tree);
  // A saw that cannot crosscut the whole piece trims the ends of each strip instead (same stages: they are trim);
  // one that cannot take the edge off the whole piece either rips the strips with the factory edges on the outer
  // ones and trims each strip on its own. The arrangement whose trim cuts ask least beyond the saws wins.
  const beyond = (steps: SawStep[]) => trimStepsBeyond(steps, stockRect(stock), stockPieceName(index), settings.kerf, saws);
  let worst = saws.length ? beyond(sawOrder) : 0;
  for (const arrange of [withStripEndTrims, withTrimsOnStrips]) {
    if (worst === 0) break;
    const alt = arrange(innerTree, stockRect(stock), trim, settings.kerf);
    const altOrder = alt && order(alt);
    const n = altOrder ? beyond(altOrder) : Infinity;
    if (alt && altOrder && n < worst) [tree, sawOrder, worst] = [alt, altOrder, n];
  }
  const leftovers = treeLeaves(tree).flatMap((l) => (l.type === 'leftover' && l.rect.w > 0 && l.rect.h > 0 ? [l.rect] : []));
  const offcuts = leftovers.filter((r) => isKeepable(r, settings.minOffcutLength, settings.minOffcutWidth));
  const waste = leftovers.filter((r) => !offcuts.includes(r));
  const piece: PlanPiece = { ...base, tree, sawOrder, offcuts, waste };
  return { ...piece, figures: pieceFigures(piece, offcuts, stock.costEach) };
}

/** How many trim steps ask more of their saw than it can do? */
function trimStepsBeyond(steps: SawStep[], whole: Rect, rootName: string, kerf: number, saws: NestSaw[]): number {
  const { cutFrom } = replaySawOrder(steps, whole, rootName, kerf);
  return steps.filter((s, i) => {
    const saw = saws.find((w) => w.name === s.saw);
    const from = cutFrom[i];
    return s.trim && !!saw && !!from && cutProblems(saw, s, from).length > 0;
  }).length;
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
