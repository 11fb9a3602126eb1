/**
 * The contract between the guillotine packing core (`lib/nesting/pack/`) and the plan layer (`lib/nesting/`).
 *
 * The core knows nothing of materials, parts or money beyond what is here: it packs rectangles into bins with
 * guillotine cuts. Coordinates: a bin's origin is its reference corner (after edge trim), x runs along the bin's
 * length (`w`), y along its width (`h`). All lengths are mm (any consistent unit works: the benchmarks use integers).
 */
import type { Rect } from '@/lib/geometry/rect';

export interface PackItem {
  /** Index-like id, unique within one call. */
  id: number;
  /** Extent along the bin's x axis when not rotated. */
  w: number;
  /** Extent along the bin's y axis when not rotated. */
  h: number;
  /** False when grain (or the caller) forbids a quarter turn. */
  canRotate: boolean;
}

export interface BinType {
  id: number;
  /** Usable size after trim. */
  w: number;
  h: number;
  /** How many of this bin may be used; `null` = as many as needed (a size the shop can buy). */
  count: number | null;
  /** Cost of using one (any currency unit); 0 for free material. */
  cost: number;
  /**
   * Lower is used first when it costs no more (existing offcuts get 0, stock on hand 1, stock to buy 2).
   * Objective ties are broken by it.
   */
  priority: number;
}

export type CuttingStyle =
  /** Any guillotine cut, any number of stages. */
  | 'panel'
  /**
   * Strips: first-stage cuts across y (rips along the length, lines y = const) make full-length strips,
   * second-stage cuts (x = const) cut parts from a strip, and at most one third-stage trim rip per part.
   */
  | 'strips';

export type Objective = 'cost' | 'pieces' | 'cuts';

export interface PackOptions {
  /** Width of material each cut removes. */
  kerf: number;
  style: CuttingStyle;
  objective: Objective;
  /** Wall-clock budget for the improvement phase; the first plan is always returned even past it. */
  timeBudgetMs: number;
  seed: number;
  signal?: AbortSignal;
  /** Called with the best result so far, at least 4 times a second while searching. */
  onProgress?: (progress: PackProgress) => void;
}

export interface PackProgress {
  elapsedMs: number;
  binsUsed: number;
  /** Item area / used bin area of the best result so far. */
  fill: number;
  cost: number;
  /** The best result so far (callers may keep it to show or to return on cancel). */
  best: PackResult;
}

/**
 * A guillotine cut tree. A `cut` node splits its rect by the straight line `axis = pos` (x = pos: a cut across the
 * x axis; y = pos: a cut along the x axis). The first child is the side below `pos`; the second starts at
 * `pos + kerf`. When the cut is flush with the rect's far edge there is no second child material and `children[1]`
 * is omitted (the cut only trims waste) — so every cut node has 1 or 2 children.
 */
export type CutNode =
  | { type: 'item'; rect: Rect; itemId: number; rotated: boolean }
  | { type: 'leftover'; rect: Rect }
  | { type: 'cut'; rect: Rect; axis: 'x' | 'y'; pos: number; kerf: number; children: [CutNode] | [CutNode, CutNode] };

export interface PackedItem {
  itemId: number;
  /** Footprint in the bin (w, h already swapped when rotated). */
  rect: Rect;
  rotated: boolean;
}

export interface PackedBin {
  binTypeId: number;
  items: PackedItem[];
  tree: CutNode;
}

export interface PackResult {
  bins: PackedBin[];
  /** Ids of items that fit no bin type in any allowed orientation, or ran out of bins with limited counts. */
  unplaced: { itemId: number; reason: 'too-large' | 'grain' | 'no-stock-left' }[];
}

/** The one entry point of the packing core. Async so it can yield to the event loop (progress, cancellation). */
export type PackFn = (items: PackItem[], bins: BinType[], options: PackOptions) => Promise<PackResult>;
