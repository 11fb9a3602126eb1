/**
 * The bench's live check: the document judged by `validatePlan` (the same code the server runs on save), with each
 * violation pinned to where it is — a placement, a stock piece, or the plan as a whole — and the leftovers
 * (offcuts to keep, waste) of every piece rebuilt with `rebuildCuts` so the canvas can shade them.
 */
import type { Rect } from '@/lib/geometry/rect';
import { rebuildCuts, validatePlan, type Violation } from '@/lib/nesting';
import type { NestRequest, Plan } from '@/shared/schemas/nesting';
import { docToPlan, placementKey, planPieceIndices, type BenchDoc } from '@/lib/layout-bench/document';

export interface LiveCheck {
  violations: Violation[];
  /** Messages by placement key. */
  byPlacement: Map<string, string[]>;
  /** Messages about a stock piece as a whole, by document piece index. */
  byPiece: Map<number, string[]>;
  /** Messages about the plan as a whole (missing parts, stock counts). */
  general: string[];
  /** Offcuts and waste by document piece index (absent for a piece that cannot be cut apart). */
  leftovers: Map<number, { offcuts: Rect[]; waste: Rect[] }>;
  /** Figures of the layout as it stands (absent when it cannot be rebuilt). */
  totals?: Plan['totals'];
}

const push = <K>(map: Map<K, string[]>, key: K, message: string) => map.set(key, [...(map.get(key) ?? []), message]);

export function checkDoc(request: NestRequest, doc: BenchDoc): LiveCheck {
  const plan = docToPlan(doc);
  const pieceOf = planPieceIndices(doc);
  const violations = validatePlan(request, plan);
  const byPlacement = new Map<string, string[]>();
  const byPiece = new Map<number, string[]>();
  const general: string[] = [];
  for (const v of violations) {
    if (v.partId !== undefined && v.instance !== undefined && doc.placements[placementKey({ partId: v.partId, instance: v.instance })]) {
      push(byPlacement, placementKey({ partId: v.partId, instance: v.instance }), v.message);
    } else if (v.piece !== undefined && pieceOf[v.piece] !== undefined) push(byPiece, pieceOf[v.piece], v.message);
    else general.push(v.message);
  }
  // Overlaps name the second part only; mark the first one as well, so both show where they are.
  for (const v of violations) {
    if (v.code !== 'overlap') continue;
    const m = /^"(.*)" #(\d+) and /.exec(v.message);
    const piece = v.piece !== undefined ? pieceOf[v.piece] : undefined;
    if (!m || piece === undefined) continue;
    for (const [key, p] of Object.entries(doc.placements)) {
      if (p.piece === piece && p.instance === Number(m[2]) && (p.label || p.partId) === m[1] && !byPlacement.get(key)?.includes(v.message))
        push(byPlacement, key, v.message);
    }
  }
  const leftovers = new Map<number, { offcuts: Rect[]; waste: Rect[] }>();
  let totals: Plan['totals'];
  try {
    const rebuilt = rebuildCuts(request, plan);
    rebuilt.pieces.forEach((p, i) => {
      if (p.offcuts || p.waste) leftovers.set(pieceOf[i], { offcuts: p.offcuts ?? [], waste: p.waste ?? [] });
    });
    totals = rebuilt.totals;
  } catch {
    // A plan that does not parse is already reported by validatePlan.
  }
  return { violations, byPlacement, byPiece, general, leftovers, totals };
}
