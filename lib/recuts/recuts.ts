import type { GrainRule, NestPart } from '@/shared/schemas/nesting';

/** What a re-cut copies from the damaged part: enough to cut it again without the cut-list row. */
export interface RecutPart {
  id: string;
  label: string;
  /** Which piece of the part was damaged: "Side #3". */
  instance: number;
  quantity: number;
  length: number;
  width: number;
  thickness: number;
  material: string;
  grain: GrainRule;
  jointAllowance: number;
  reason: string;
}

/** Said when the cutter gives no reason. */
export const DEFAULT_RECUT_REASON = 'Damaged at the saw';

/** Common ways a part is spoiled at the saw, offered (not imposed) when the cutter records one. */
export const RECUT_REASONS = [
  'Tear-out',
  'Chipped edge',
  'Cut undersize',
  'Cut to the wrong size',
  'Dropped or dented',
  'Defect in the sheet',
] as const;

/** "Side #3": the part's label with the piece that was damaged. */
export const recutLabel = (r: Pick<RecutPart, 'label' | 'instance'>) => `${r.label || 'Part'} #${r.instance}`;

/**
 * The re-cuts as the parts of a Nest: each keeps its re-cut's id (so finishing the plan closes exactly those), its
 * label with "#n" and "re-cut" (the saw order and tags add their own count: "Side #3 · re-cut #1"), size, material,
 * thickness and grain. A nest of re-cuts holds nothing else.
 */
export function recutNestParts(recuts: RecutPart[]): NestPart[] {
  return recuts.map((r) => ({
    id: r.id,
    label: `${recutLabel(r)} · re-cut`,
    quantity: r.quantity,
    length: r.length,
    width: r.width,
    thickness: r.thickness,
    material: r.material,
    grain: r.grain,
    jointAllowance: r.jointAllowance,
    group: 'recuts',
    notes: `Re-cut: ${r.reason || DEFAULT_RECUT_REASON}`,
  }));
}

/**
 * A finished plan's figures with its damaged parts taken out of the yield: their area is spoiled, counted as waste
 * and kept apart from the saw's own waste (trim, kerf, pieces too small to keep).
 * yield = (part area − spoiled) / stock; waste = (stock − (part area − spoiled) − kept offcuts) / stock;
 * spoiled = spoiled / stock; saw waste = waste − spoiled.
 */
export function finishFigures({
  stockArea,
  partArea,
  keptOffcutArea,
  spoiledArea,
}: {
  stockArea: number;
  partArea: number;
  keptOffcutArea: number;
  spoiledArea: number;
}) {
  if (!(stockArea > 0)) return { yieldRatio: 0, wasteRatio: 0, spoiledRatio: 0, sawWasteRatio: 0 };
  const spoiled = Math.min(Math.max(0, spoiledArea), partArea);
  const good = Math.max(0, partArea - spoiled);
  const waste = Math.max(0, stockArea - good - keptOffcutArea);
  return {
    yieldRatio: good / stockArea,
    wasteRatio: waste / stockArea,
    spoiledRatio: spoiled / stockArea,
    sawWasteRatio: Math.max(0, waste - spoiled) / stockArea,
  };
}
