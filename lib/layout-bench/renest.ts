/**
 * Re-nesting the unlocked parts around the locked ones. Chosen approach: each stock piece that holds locked parts
 * keeps them where they are; the free rectangles left between them (the leftovers of a guillotine tree of the
 * locked parts alone, so every one is freed by straight through-cuts) become offcut-like stock with sawn edges.
 * Every unlocked part (and every unplaced one) is then nested by the engine onto those free rectangles first and the
 * rest of the request's stock (on-hand counts less the pieces kept). The result is mapped back: placements on a free
 * rectangle are shifted onto their piece. `validatePlan` remains the judge of the outcome.
 */
import { findGuillotineTree, treeLeaves } from '@/lib/nesting/guillotine';
import { stageRule } from '@/lib/nesting/saw-profile';
import { usableRect } from '@/lib/nesting/stock-rules';
import type { NestRequest, NestStock, Plan, Unplaced } from '@/shared/schemas/nesting';
import { placementKey, type BenchDoc, type BenchPiece, type BenchPlacement } from '@/lib/layout-bench/document';

const FREE_PREFIX = 'free:';

export interface RenestJob {
  /** The request to hand the engine (worker). */
  request: NestRequest;
  /** The document with the engine's plan for the unlocked parts merged around the locked ones. */
  merge(plan: Plan): BenchDoc;
}

export function prepareRenest(request: NestRequest, doc: BenchDoc): RenestJob {
  const locked = Object.values(doc.placements).filter((p) => p.locked);
  const keptPieces = [...new Set(locked.map((p) => p.piece))].sort((a, b) => a - b);
  const free = freeRectangles(doc, locked, keptPieces, request.settings);
  const moving = movingInstances(doc);
  const parts = request.parts.filter((p) => moving.has(p.id)).map((p) => ({ ...p, quantity: moving.get(p.id)!.length }));
  const sub: NestRequest = {
    parts,
    stock: [...free.stock, ...stockLessKept(request.stock, doc, keptPieces)],
    settings: { ...request.settings, preferOffcuts: true },
  };
  return { request: sub, merge: (plan) => mergePlan(plan, { request, doc, locked, keptPieces, freeAt: free.at, moving }) };
}

/** Where a free rectangle (by its stock id) lies: on which kept piece, and its corner there. */
type FreeAt = Map<string, { piece: number; x: number; y: number }>;

/**
 * The free rectangles on each kept piece, as offcut-like stock with sawn edges: the leftovers of a guillotine tree
 * of the locked parts alone (in the saw's stages if it can, else in any), so each is freed by straight through-cuts.
 */
function freeRectangles(doc: BenchDoc, locked: BenchPlacement[], keptPieces: number[], settings: NestRequest['settings']) {
  const stock: NestStock[] = [];
  const at: FreeAt = new Map();
  keptPieces.forEach((pieceIndex, k) => {
    const piece = doc.pieces[pieceIndex];
    const mine = locked.filter((p) => p.piece === pieceIndex);
    const rule = stageRule(settings);
    const tree =
      findGuillotineTree(usableRect(piece, piece.trim), mine, settings.kerf, rule.maxStages, rule.firstAxis) ??
      findGuillotineTree(usableRect(piece, piece.trim), mine, settings.kerf);
    if (!tree) return; // locked parts that cannot be cut apart: nothing more goes on this piece
    treeLeaves(tree).forEach((leaf, j) => {
      if (leaf.type !== 'leftover' || leaf.rect.w <= 0 || leaf.rect.h <= 0) return;
      const id = `${FREE_PREFIX}${k}:${j}`;
      at.set(id, { piece: pieceIndex, x: leaf.rect.x, y: leaf.rect.y });
      stock.push({
        id,
        kind: 'offcut',
        length: leaf.rect.w,
        width: leaf.rect.h,
        thickness: piece.thickness,
        material: piece.material,
        grain: piece.grain,
        count: 1,
        costEach: 0,
        trimmed: true,
      });
    });
  });
  return { stock, at };
}

/** The request's stock, less the pieces kept (a size used up is left out). */
function stockLessKept(stock: NestStock[], doc: BenchDoc, keptPieces: number[]): NestStock[] {
  const keptCount = new Map<string, number>();
  for (const i of keptPieces) keptCount.set(doc.pieces[i].stockId, (keptCount.get(doc.pieces[i].stockId) ?? 0) + 1);
  return stock
    .map((s) => (s.count === null ? s : { ...s, count: s.count - (keptCount.get(s.id) ?? 0) }))
    .filter((s) => s.count === null || s.count > 0);
}

/** The unlocked and unplaced instances of each part, in order: the engine numbers them 1..n, this maps back. */
function movingInstances(doc: BenchDoc): Map<string, number[]> {
  const moving = new Map<string, number[]>();
  const add = (partId: string, instance: number) => moving.set(partId, [...(moving.get(partId) ?? []), instance]);
  for (const p of Object.values(doc.placements)) if (!p.locked) add(p.partId, p.instance);
  for (const u of doc.unplaced) add(u.partId, u.instance);
  for (const list of moving.values()) list.sort((a, b) => a - b);
  return moving;
}

interface MergeContext {
  request: NestRequest;
  doc: BenchDoc;
  locked: BenchPlacement[];
  keptPieces: number[];
  freeAt: FreeAt;
  moving: Map<string, number[]>;
}

/** The engine's plan merged around the locked parts: kept pieces first, placements on a free rectangle shifted onto its piece. */
function mergePlan(plan: Plan, { request, doc, locked, keptPieces, freeAt, moving }: MergeContext): BenchDoc {
  const original = (partId: string, instance: number) => moving.get(partId)![instance - 1];
  const pieces: BenchPiece[] = keptPieces.map((i) => doc.pieces[i]);
  const newIndex = new Map(keptPieces.map((old, i) => [old, i]));
  const placements: Record<string, BenchPlacement> = {};
  for (const p of locked) placements[placementKey(p)] = { ...p, piece: newIndex.get(p.piece)! };
  for (const planPiece of plan.pieces) {
    const free = freeAt.get(planPiece.stockId);
    let target: number;
    let dx = 0;
    let dy = 0;
    if (free) {
      target = newIndex.get(free.piece)!;
      dx = free.x;
      dy = free.y;
    } else {
      target = pieces.length;
      pieces.push(newPiece(planPiece, request));
    }
    for (const pl of planPiece.placements) {
      const instance = original(pl.partId, pl.instance);
      placements[placementKey({ partId: pl.partId, instance })] = {
        partId: pl.partId,
        instance,
        label: pl.label,
        piece: target,
        x: pl.x + dx,
        y: pl.y + dy,
        w: pl.w,
        h: pl.h,
        rotated: pl.rotated,
        locked: false,
      };
    }
  }
  const unplaced: Unplaced[] = plan.unplaced.map((u) => ({ ...u, instance: original(u.partId, u.instance) }));
  return { pieces, placements, unplaced };
}

/** A stock piece the engine took from the request's stock (not a free rectangle), with that stock's grain. */
function newPiece(planPiece: Plan['pieces'][number], request: NestRequest): BenchPiece {
  const s = request.stock.find((st) => st.id === planPiece.stockId);
  return {
    stockId: planPiece.stockId,
    kind: planPiece.kind,
    length: planPiece.length,
    width: planPiece.width,
    thickness: planPiece.thickness,
    material: planPiece.material,
    trim: planPiece.trim,
    grain: s?.grain ?? 'along-length',
  };
}
