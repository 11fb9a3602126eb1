/** One tag per placed part instance: what the tag says and where its QR code leads. */
import type { Plan, NestPart } from '@/shared/schemas/nesting';
import { stockPieceName } from '@/lib/nesting/saw-order';

export interface PartTag {
  partId: string;
  instance: number;
  label: string;
  /** Along the grain (the part's length) and across it, mm. */
  length: number;
  width: number;
  /** True when the grain must run along the part's length: the tag shows an arrow. */
  grain: boolean;
  pieceIndex: number;
  pieceName: string;
}

/** Tags in saw order: by stock piece, then as placed. Parts the plan could not place get no tag (nothing to cut). */
export function partTags(plan: Pick<Plan, 'pieces'>, parts: readonly Pick<NestPart, 'id' | 'grain'>[]): PartTag[] {
  const grainOf = new Map(parts.map((p) => [p.id, p.grain]));
  return plan.pieces.flatMap((piece, pieceIndex) =>
    piece.placements.map((p) => ({
      partId: p.partId,
      instance: p.instance,
      label: p.label || 'Part',
      length: p.rotated ? p.h : p.w,
      width: p.rotated ? p.w : p.h,
      grain: (grainOf.get(p.partId) ?? 'along-length') === 'along-length',
      pieceIndex,
      pieceName: stockPieceName(pieceIndex),
    })),
  );
}

/** Where a tag's QR code leads: the part's page, with the plan and instance so it can show the piece. */
export const partTagPath = (planId: string, tag: Pick<PartTag, 'partId' | 'instance'>) =>
  `/parts/${encodeURIComponent(tag.partId)}?plan=${encodeURIComponent(planId)}&instance=${tag.instance}`;
