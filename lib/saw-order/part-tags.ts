/** One tag per placed part instance: what the tag says and where its QR code leads. */
import type { Plan, NestPart } from '@/shared/schemas/nesting';
import { stockPieceName } from '@/lib/nesting/saw-order';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { formatLength, type LengthStyle } from '@/lib/units/format-length';
import type { ShopUnits } from '@/shared/schemas/units';

export interface PartTag {
  partId: string;
  instance: number;
  label: string;
  /** Along the grain (the part's length) and across it, mm. */
  length: number;
  width: number;
  /** True when the grain must run along the part's length: the tag shows an arrow. */
  grain: boolean;
  /** What it is cut from: the stock piece's material and thickness (mm). */
  material: string;
  thickness: number;
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
      material: piece.material,
      thickness: piece.thickness,
      pieceIndex,
      pieceName: stockPieceName(pieceIndex),
    })),
  );
}

/** Where a tag's QR code leads: the part's page, with the plan and instance so it can show the piece. */
export const partTagPath = (planId: string, tag: Pick<PartTag, 'partId' | 'instance'>) =>
  `/parts/${encodeURIComponent(tag.partId)}?plan=${encodeURIComponent(planId)}&instance=${tag.instance}`;

/** What a tag says, line by line, the same on the screen and in the PDF. */
export interface TagText {
  name: string;
  /** "#3": which of the part's quantity this is; never left off, however long the name. */
  number: string;
  /** Length along the grain × width, in the shop's unit. */
  size: string;
  material: string;
  /** The stock's thickness, exactly (23/32″, 18 mm), never a rounded value. */
  thickness: string;
  piece: string;
}

export function tagText(tag: PartTag, units: ShopUnits, style: LengthStyle = 'hyphen'): TagText {
  const len = (mm: number) => formatLength(mm, units, { style });
  return {
    name: tag.label,
    number: `#${tag.instance}`,
    size: `${len(tag.length)}${style === 'ascii' ? ' x ' : ' × '}${len(tag.width)}`,
    material: tag.material,
    thickness: exactLengthText(tag.thickness, units, style),
    piece: `Piece ${tag.pieceName}`,
  };
}
