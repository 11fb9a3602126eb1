/**
 * Reading a saved plan onto the bench. People who may not see prices (cutters) are served plans with every price
 * left out; the bench never shows prices, so it reads such a plan with zero in their place rather than refusing it.
 */
import { readPlan, type Plan } from '@/lib/nesting';

type Loose = Record<string, unknown>;
const isObject = (v: unknown): v is Loose => typeof v === 'object' && v !== null;
const withCost = (v: unknown) => (isObject(v) ? { cost: 0, ...v } : v);
const lines = (v: unknown) => (Array.isArray(v) ? v.map((l) => (isObject(l) ? { cost: 0, costEach: 0, ...l } : l)) : v);

export function readBenchPlan(document: unknown): Plan {
  if (!isObject(document)) return readPlan(document);
  const pieces = Array.isArray(document.pieces)
    ? document.pieces.map((p) => (isObject(p) && isObject(p.figures) ? { ...p, figures: withCost(p.figures) } : p))
    : document.pieces;
  const filled: Loose = { ...document, pieces, stockToPull: lines(document.stockToPull), stockToBuy: lines(document.stockToBuy) };
  if (document.totals !== undefined) filled.totals = withCost(document.totals);
  return readPlan(filled);
}
