/** How the request's stock and parts meet: edge trim, usable area, material groups. */
import type { Rect } from '@/lib/geometry/rect';
import type { NestPart, NestSettings, NestStock } from '@/shared/schemas/nesting';

/** Thicknesses within this are the same stock (0.01 mm). */
export const THICKNESS_TOLERANCE = 0.01;

/**
 * Edge trim taken from each side: factory edges (sheets, boards) lose `settings.trim`; offcuts have sawn edges and
 * lose nothing, unless marked `trimmed: false` (an offcut that still has factory edges).
 */
export const trimFor = (stock: Pick<NestStock, 'kind' | 'trimmed'>, settings: Pick<NestSettings, 'trim'>) =>
  stock.kind === 'offcut' && stock.trimmed !== false ? 0 : settings.trim;

/** The whole stock piece: x along its length. */
export const stockRect = (s: { length: number; width: number }): Rect => ({ x: 0, y: 0, w: s.length, h: s.width });

/** The area parts may use, after trim. */
export const usableRect = (s: { length: number; width: number }, trim: number): Rect => ({
  x: trim,
  y: trim,
  w: s.length - 2 * trim,
  h: s.width - 2 * trim,
});

const materialKey = (m: string) => m.trim().toLowerCase();

/** Same material (case and outer spaces ignored) and thickness within 0.01 mm. */
export const sameStock = (a: { material: string; thickness: number }, b: { material: string; thickness: number }) =>
  materialKey(a.material) === materialKey(b.material) && Math.abs(a.thickness - b.thickness) <= THICKNESS_TOLERANCE + 1e-9;

/** Parts grouped by material and thickness, in order of first appearance. */
export function groupParts(parts: readonly NestPart[]): NestPart[][] {
  const groups: NestPart[][] = [];
  for (const p of parts) {
    const g = groups.find((grp) => sameStock(grp[0], p));
    if (g) g.push(p);
    else groups.push([p]);
  }
  return groups;
}

/** May this placement be turned a quarter on this stock? */
export const rotationAllowed = (part: Pick<NestPart, 'grain'>, stock: Pick<NestStock, 'grain'>) => part.grain === 'any' || stock.grain === 'none';

/**
 * May the part turn when packed on this group of stock? The packing core takes one flag per part, so a grain-locked
 * part turns only when every stock of its group is grainless (a group mixing grains is rare).
 */
export const mayTurnInGroup = (part: Pick<NestPart, 'grain'>, stocks: readonly Pick<NestStock, 'grain'>[]) =>
  stocks.length > 0 && stocks.every((s) => rotationAllowed(part, s));

/** The stock a part may go on: same material and thickness, with usable area left after trim. */
export const stockForPart = (part: Pick<NestPart, 'material' | 'thickness'>, stock: readonly NestStock[], settings: Pick<NestSettings, 'trim'>) =>
  stock.filter((s) => {
    const u = usableRect(s, trimFor(s, settings));
    return sameStock(s, part) && u.w > 0 && u.h > 0;
  });

/** Does the part fit the stock's usable area unturned / turned? */
export function fitsOn(part: Pick<NestPart, 'length' | 'width'>, stock: NestStock, settings: Pick<NestSettings, 'trim'>) {
  const u = usableRect(stock, trimFor(stock, settings));
  const eps = 1e-6;
  return { straight: part.length <= u.w + eps && part.width <= u.h + eps, turned: part.width <= u.w + eps && part.length <= u.h + eps };
}
