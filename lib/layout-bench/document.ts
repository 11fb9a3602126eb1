/**
 * The layout bench's document: the stock pieces of a plan and every placement on them, keyed by part instance.
 * View state (selection, camera, drag preview) lives apart, in the store. Everything in mm, stock coordinates.
 */
import type { NestPart, NestRequest, Plan, PlanInput, PlanPiece, Unplaced } from '@/shared/schemas/nesting';

/** One stock piece of the plan (a Sheet map or Board map), without its placements. */
export interface BenchPiece {
  stockId: string;
  kind: PlanPiece['kind'];
  length: number;
  width: number;
  thickness: number;
  material: string;
  trim: number;
  grain: 'along-length' | 'none';
}

export interface BenchPlacement {
  partId: string;
  instance: number;
  label: string;
  /** Index into `BenchDoc.pieces`. */
  piece: number;
  x: number;
  y: number;
  w: number;
  h: number;
  rotated: boolean;
  locked: boolean;
}

export interface BenchDoc {
  pieces: BenchPiece[];
  /** By `placementKey`. */
  placements: Record<string, BenchPlacement>;
  unplaced: Unplaced[];
}

/** One part instance's key: stable across moves between pieces. */
export const placementKey = (p: { partId: string; instance: number }) => `${p.partId}#${p.instance}`;

/** The plan as a bench document; stock grain comes from the request (a piece of unknown stock counts as grained). */
export function planToDoc(plan: Plan, request: Pick<NestRequest, 'stock'>, locked: ReadonlySet<string> = new Set()): BenchDoc {
  const grainOf = new Map(request.stock.map((s) => [s.id, s.grain]));
  const placements: Record<string, BenchPlacement> = {};
  const pieces = plan.pieces.map((p, piece) => {
    for (const pl of p.placements) {
      const key = placementKey(pl);
      placements[key] = {
        partId: pl.partId,
        instance: pl.instance,
        label: pl.label,
        piece,
        x: pl.x,
        y: pl.y,
        w: pl.w,
        h: pl.h,
        rotated: pl.rotated,
        locked: pl.locked === true || locked.has(key),
      };
    }
    return {
      stockId: p.stockId,
      kind: p.kind,
      length: p.length,
      width: p.width,
      thickness: p.thickness,
      material: p.material,
      trim: p.trim,
      grain: grainOf.get(p.stockId) ?? 'along-length',
    };
  });
  return { pieces, placements, unplaced: plan.unplaced };
}

/**
 * The document as a plan of bare placements (no trees or saw orders: `rebuildCuts` makes them). A piece left with
 * no parts is dropped, so its stock is not drawn; placements keep a stable order (by key) within each piece.
 */
export function docToPlan(doc: BenchDoc): PlanInput {
  const byPiece = doc.pieces.map(() => [] as BenchPlacement[]);
  for (const key of Object.keys(doc.placements).sort()) {
    const p = doc.placements[key];
    byPiece[p.piece]?.push(p);
  }
  return {
    version: 1,
    pieces: doc.pieces
      .map((piece, i) => ({
        stockId: piece.stockId,
        kind: piece.kind,
        length: piece.length,
        width: piece.width,
        thickness: piece.thickness,
        material: piece.material,
        trim: piece.trim,
        placements: byPiece[i].map(({ partId, instance, label, x, y, w, h, rotated, locked }) => ({
          partId,
          instance,
          label,
          x,
          y,
          w,
          h,
          rotated,
          ...(locked && { locked }),
        })),
      }))
      .filter((p) => p.placements.length > 0),
    unplaced: doc.unplaced,
  };
}

/** Piece indices of `docToPlan(doc)` → indices in `doc.pieces` (empty pieces are dropped from the plan). */
export function planPieceIndices(doc: BenchDoc): number[] {
  const used = new Set(Object.values(doc.placements).map((p) => p.piece));
  return doc.pieces.map((_, i) => i).filter((i) => used.has(i));
}

export type PartInfo = Pick<NestPart, 'id' | 'label' | 'length' | 'width' | 'grain' | 'material' | 'thickness' | 'group'>;
