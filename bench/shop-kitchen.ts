/**
 * An invented shop job for the benchmark: the "Alder Lane" kitchen and utility room — base, wall and tall carcasses
 * in 18 mm birch plywood, drawer boxes in 12 mm with 6 mm bottoms, 6 mm backs — on 2440 × 1220 mm sheets with a
 * 3.2 mm kerf and 10 mm edge trim. Visible and structural long parts keep their grain along the length.
 * Sizes follow common practice (no source): 720 mm carcass height, 560 / 320 mm depths, 18 mm sides, side-mount
 * slides taking 12.5 mm a side, 500 mm drawer boxes, butt-jointed fronts and backs between the sides.
 */
import type { NestPart, NestRequestInput } from '@/shared/schemas/nesting';

const SHEET = { length: 2440, width: 1220 };
const PLY = 'Birch plywood';
const SIDE = 18;
const DRAWER_SIDE = 12;

type PartIn = Pick<NestPart, 'id' | 'label' | 'quantity' | 'length' | 'width' | 'thickness' | 'material' | 'grain'> & { group?: string };

const part = (
  group: string,
  name: string,
  quantity: number,
  length: number,
  width: number,
  thickness: number,
  grain: 'along-length' | 'any',
): PartIn => ({
  id: `${group}-${name}`,
  label: `${group} ${name}`,
  quantity,
  length,
  width,
  thickness,
  material: PLY,
  grain,
  group,
});

function baseUnit(tag: string, width: number, drawers: number[]): PartIn[] {
  const inner = width - 2 * SIDE;
  const parts = [
    part(tag, 'side', 2, 720, 560, SIDE, 'along-length'),
    part(tag, 'bottom', 1, inner, 560, SIDE, 'any'),
    part(tag, 'rail', 2, inner, 100, SIDE, 'any'),
    part(tag, 'back', 1, 716, width - 4, 6, 'any'),
  ];
  if (drawers.length === 0) return [...parts, part(tag, 'shelf', 1, inner - 2, 520, SIDE, 'any')];
  const boxWidth = inner - 25;
  drawers.forEach((height, k) => {
    const d = `${tag}-d${k + 1}`;
    parts.push(
      part(d, 'side', 2, 500, height, DRAWER_SIDE, 'along-length'),
      part(d, 'front-back', 2, boxWidth - 2 * DRAWER_SIDE, height, DRAWER_SIDE, 'along-length'),
      part(d, 'bottom', 1, boxWidth - 2 * DRAWER_SIDE + 12, 500 - 2 * DRAWER_SIDE + 12, 6, 'any'),
    );
  });
  return parts;
}

/** Wall and tall units: two sides, top and bottom between them, shelves, a 6 mm back. */
function carcass(tag: string, width: number, height: number, depth: number, shelves: number): PartIn[] {
  const inner = width - 2 * SIDE;
  return [
    part(tag, 'side', 2, height, depth, SIDE, 'along-length'),
    part(tag, 'top-bottom', 2, inner, depth, SIDE, 'any'),
    part(tag, 'shelf', shelves, inner - 2, depth - 20, SIDE, 'any'),
    part(tag, 'back', 1, height - 4, width - 4, 6, 'any'),
  ];
}

const THREE = [140, 200, 260];
const FOUR = [110, 140, 170, 200];

export function kitchenParts(): PartIn[] {
  const base: [number, number[]][] = [
    [300, []],
    [400, []],
    [450, THREE],
    [500, []],
    [600, THREE],
    [600, []],
    [600, FOUR],
    [800, THREE],
    [900, []],
    [900, FOUR],
    [1000, []],
    [600, []],
    [450, []],
    [400, FOUR],
    [600, THREE],
    [800, []],
    [500, THREE],
    [300, []],
  ];
  const wall = [300, 400, 500, 600, 600, 800, 900, 600, 500, 400, 450, 600, 800, 300, 600, 500];
  const tall = [600, 600, 450];
  return [
    ...base.flatMap(([w, drawers], k) => baseUnit(`B${k + 1}`, w, drawers)),
    ...wall.flatMap((w, k) => carcass(`W${k + 1}`, w, 720, 320, 2)),
    ...tall.flatMap((w, k) => carcass(`T${k + 1}`, w, 2100, 560, 4)),
    part('E', 'end-panel', 3, 870, 600, SIDE, 'along-length'),
    part('E', 'tall-end-panel', 1, 2150, 600, SIDE, 'along-length'),
    part('K', 'toe-kick', 4, 2400, 100, SIDE, 'along-length'),
    part('F', 'filler', 4, 720, 60, SIDE, 'along-length'),
  ];
}

export const KITCHEN_STOCK = [
  { id: 'ply-18', thickness: 18, costEach: 96 },
  { id: 'ply-12', thickness: 12, costEach: 78 },
  { id: 'ply-6', thickness: 6, costEach: 41 },
].map((s) => ({ ...s, kind: 'sheet' as const, ...SHEET, material: PLY, grain: 'along-length' as const, count: null }));

export function kitchenRequest(budgetMs: number): NestRequestInput {
  return {
    parts: kitchenParts(),
    stock: KITCHEN_STOCK,
    settings: { kerf: 3.2, trim: 10, objective: 'cost', style: 'panel', timeBudgetMs: budgetMs, seed: 1 },
  };
}
