/**
 * The invented kitchen job (bench/shop-kitchen.ts) through the public `optimize`: sheets used per thickness against a
 * lower bound, yield, material cost, time, and the plan judged by `validatePlan`.
 */
import { lowerBound } from '@/lib/nesting/bounds';
import { optimize, validatePlan } from '@/lib/nesting';
import { nestRequestSchema } from '@/shared/schemas/nesting';
import { kitchenRequest } from './shop-kitchen';

export interface ShopResult {
  parts: number;
  ms: number;
  sheets: number;
  yield: number;
  cost: number;
  unplaced: number;
  violations: string[];
  byThickness: { thickness: number; parts: number; sheets: number; lowerBound: number }[];
}

export async function runShop(budgetMs: number): Promise<ShopResult> {
  const input = kitchenRequest(budgetMs);
  const request = nestRequestSchema.parse(input);
  const { kerf, trim } = request.settings;
  const t0 = performance.now();
  const plan = await optimize(input);
  const ms = performance.now() - t0;

  const thicknesses = [...new Set(request.parts.map((p) => p.thickness))].sort((a, b) => b - a);
  const byThickness = thicknesses.map((thickness) => {
    const parts = request.parts.filter((p) => p.thickness === thickness);
    const sheet = request.stock.find((s) => s.thickness === thickness)!;
    // Kerf as a gap: every part grown by one kerf fits a sheet grown by one kerf (trim, kerf included, taken off).
    const sizes = parts.flatMap((p) => Array.from({ length: p.quantity }, () => ({ w: p.length + kerf, h: p.width + kerf })));
    const bin = { w: sheet.length - 2 * trim + kerf, h: sheet.width - 2 * trim + kerf };
    // A grain-locked part may not turn, but letting it turn only relaxes the problem: still a valid bound.
    const rotation = parts.some((p) => p.grain === 'any');
    return {
      thickness,
      parts: sizes.length,
      sheets: plan.pieces.filter((piece) => piece.thickness === thickness).length,
      lowerBound: lowerBound(sizes, bin, rotation),
    };
  });
  return {
    parts: request.parts.reduce((n, p) => n + p.quantity, 0),
    ms,
    sheets: plan.pieces.length,
    yield: plan.totals?.yield ?? Number.NaN,
    cost: plan.totals?.cost ?? Number.NaN,
    unplaced: plan.unplaced.length,
    violations: validatePlan(input, plan).map((v) => `${v.code}: ${v.message}`),
    byThickness,
  };
}
