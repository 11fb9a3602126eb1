/** Rebuilds cut trees, saw orders, leftovers and figures of a plan from its bare placements (layout bench edits). */
import { findGuillotineTree } from '@/lib/nesting/guillotine';
import { stageRule } from '@/lib/nesting/saw-profile';
import { assemblePiece, assemblePlan } from '@/lib/nesting/assemble-plan';
import { trimFor, usableRect } from '@/lib/nesting/stock-rules';
import { nestRequestSchema, planSchema, type NestRequestInput, type Plan, type PlanInput } from '@/shared/schemas/nesting';

/**
 * The plan with every piece's tree, saw order, leftovers and figures made afresh from its placements. A piece that
 * straight through-cuts cannot separate (or unknown stock) keeps its placements only; `validatePlan` says why.
 * Throws a ZodError when the request or plan does not parse.
 */
export function rebuildCuts(requestInput: NestRequestInput, planInput: PlanInput): Plan {
  const request = nestRequestSchema.parse(requestInput);
  const plan = planSchema.parse(planInput);
  const { kerf } = request.settings;
  const rule = stageRule(request.settings);
  const pieces = plan.pieces.map((piece, i) => {
    const stock = request.stock.find((s) => s.id === piece.stockId);
    if (!stock) {
      const { tree: _t, sawOrder: _s, offcuts: _o, waste: _w, figures: _f, ...bare } = piece;
      return bare;
    }
    const usable = usableRect(stock, trimFor(stock, request.settings));
    const tree = findGuillotineTree(usable, piece.placements, kerf, rule.maxStages, rule.firstAxis);
    return assemblePiece(stock, i, piece.placements, tree, request);
  });
  return assemblePlan(request, pieces, plan.unplaced, plan.cancelled);
}
