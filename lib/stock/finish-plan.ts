/**
 * What finishing a plan does to the shop's material, decided here and written by `db/queries/plan-lifecycle.ts`:
 * from the plan, the request it was nested from, the cutter's choices about its offcuts and the parts they marked
 * damaged, which offcuts go on the rack (with their size, grain, place and value), which parts were spoiled, and
 * the plan's yield, waste and cost figures. Pure: no database, no HTTP.
 */
import { finishFigures } from '@/lib/recuts/recuts';
import type { Mm } from '@/lib/units/length';
import type { NestRequest, Plan } from '@/shared/schemas/nesting';
import type { FinishPlanChoices } from '@/shared/schemas/stock';
import { isKeepableOffcut, offcutCostCents, offcutSize } from './offcut-rules';

/** A choice that names no offcut or part of the plan, or names a part twice: the cutter's request is refused. */
export class FinishChoiceError extends Error {}

export interface MinOffcut {
  minLength: Mm;
  minWidth: Mm;
}

/**
 * The smallest offcut worth racking for this plan: the one it was nested with (its request's settings), or, when
 * the stored request cannot be read, the shop's settings now. The finish page and the server both ask here.
 */
export function minOffcutFor(request: NestRequest | null, shop: { minOffcutLength: Mm; minOffcutWidth: Mm }): MinOffcut {
  return request
    ? { minLength: request.settings.minOffcutLength, minWidth: request.settings.minOffcutWidth }
    : { minLength: shop.minOffcutLength, minWidth: shop.minOffcutWidth };
}

/** Stock area, part area and cost of a plan, from its totals or, for an edited plan without totals, its pieces. */
export function planFigures(plan: Plan): { stockArea: number; partArea: number; cost: number } {
  if (plan.totals) return { stockArea: plan.totals.stockArea, partArea: plan.totals.partArea, cost: plan.totals.cost };
  return plan.pieces.reduce(
    (acc, p) => ({
      stockArea: acc.stockArea + p.length * p.width,
      partArea: acc.partArea + p.placements.reduce((a, pl) => a + pl.w * pl.h, 0),
      cost: acc.cost + (p.figures?.cost ?? 0),
    }),
    { stockArea: 0, partArea: 0, cost: 0 },
  );
}

export interface RackedOffcut {
  /** The piece (0-based) and its offcut (0-based) it was cut from. */
  piece: number;
  index: number;
  material: string;
  thickness: Mm;
  length: Mm;
  width: Mm;
  grain: 'along-length' | 'none';
  location: string;
  /** Its share of the piece's cost, by area. */
  costCents: number;
}

export interface DamagedPlacement {
  piece: number;
  partId: string;
  instance: number;
  /** Where the part lay on its piece (a placement's position is unique on its piece). */
  x: Mm;
  y: Mm;
}

export interface FinishOutcome {
  rack: RackedOffcut[];
  damaged: DamagedPlacement[];
  keptArea: number;
  damagedArea: number;
  yieldRatio: number;
  wasteRatio: number;
  spoiledRatio: number;
  costCents: number;
}

/**
 * Every keepable offcut goes on the rack unless the cutter discards it; every part marked damaged must lie on the
 * plan, once. Damaged parts count as spoiled, not yield; racked offcuts as kept, not waste.
 */
export function finishOutcome(
  plan: Plan,
  request: NestRequest | null,
  min: MinOffcut,
  choices: Pick<FinishPlanChoices, 'offcuts' | 'damaged'>,
): FinishOutcome {
  const chosen = new Map(choices.offcuts.map((o) => [`${o.piece}:${o.index}`, o]));
  for (const o of choices.offcuts) {
    if (!plan.pieces[o.piece]?.offcuts?.[o.index]) throw new FinishChoiceError(`Piece ${o.piece + 1} has no offcut ${o.index + 1}.`);
  }
  const stockById = new Map((request?.stock ?? []).map((s) => [s.id, s]));
  const rack: RackedOffcut[] = [];
  let keptArea = 0;
  for (const [p, piece] of plan.pieces.entries()) {
    const source = stockById.get(piece.stockId);
    const grain = source?.grain ?? 'along-length';
    for (const [i, rect] of (piece.offcuts ?? []).entries()) {
      const choice = chosen.get(`${p}:${i}`);
      if (choice && !choice.keep) continue;
      if (!isKeepableOffcut(rect, min)) continue;
      rack.push({
        piece: p,
        index: i,
        material: piece.material,
        thickness: piece.thickness,
        ...offcutSize(rect, grain),
        grain,
        location: choice?.location ?? '',
        costCents: offcutCostCents(rect, { w: piece.length, h: piece.width }, Math.round(source?.costEach ?? 0)),
      });
      keptArea += rect.w * rect.h;
    }
  }

  const seen = new Set<string>();
  const damaged: DamagedPlacement[] = [];
  let damagedArea = 0;
  for (const d of choices.damaged) {
    const key = `${d.piece}:${d.partId}:${d.instance}`;
    if (seen.has(key)) throw new FinishChoiceError(`Part ${d.partId} #${d.instance} on piece ${d.piece + 1} is listed as damaged twice.`);
    seen.add(key);
    const placed = plan.pieces[d.piece]?.placements.find((pl) => pl.partId === d.partId && pl.instance === d.instance);
    if (!placed) throw new FinishChoiceError(`Piece ${d.piece + 1} has no part ${d.partId} #${d.instance}.`);
    damaged.push({ piece: d.piece, partId: d.partId, instance: d.instance, x: placed.x, y: placed.y });
    damagedArea += placed.w * placed.h;
  }

  const figures = planFigures(plan);
  const ratios = finishFigures({ stockArea: figures.stockArea, partArea: figures.partArea, keptOffcutArea: keptArea, spoiledArea: damagedArea });
  return {
    rack,
    damaged,
    keptArea,
    damagedArea,
    yieldRatio: ratios.yieldRatio,
    wasteRatio: ratios.wasteRatio,
    spoiledRatio: ratios.spoiledRatio,
    costCents: Math.round(figures.cost),
  };
}
