/**
 * `optimize`: a nesting request in, a plan out. Parts are grouped by material and thickness; each group is packed
 * on the stock of that material and thickness by the guillotine core (`lib/nesting/pack`), then translated back to
 * stock coordinates and assembled into plan pieces (trim cuts, saw order, leftovers, figures).
 */
import { area } from '@/lib/geometry/rect';
import { packGuillotine } from '@/lib/nesting/pack';
import type { BinType, CutNode, PackFn, PackItem, PackResult } from '@/lib/nesting/pack/types';
import { countStages, findGuillotineTree } from '@/lib/nesting/guillotine';
import { stageRule, type StageRule } from '@/lib/nesting/saw-profile';
import { packTwoStage } from '@/lib/nesting/two-stage';
import type { CuttingStyle } from '@/lib/nesting/pack/types';
import { checkTree, translateTree } from '@/lib/nesting/cut-tree';
import { assemblePiece, assemblePlan } from '@/lib/nesting/assemble-plan';
import { groupParts, mayTurnInGroup, sameStock, stockForPart, trimFor, usableRect } from '@/lib/nesting/stock-rules';
import {
  nestRequestSchema,
  type NestPart,
  type NestRequest,
  type NestRequestInput,
  type NestStock,
  type Placement,
  type Plan,
  type PlanPiece,
  type Unplaced,
  type UnplacedReason,
} from '@/shared/schemas/nesting';

export interface OptimizeProgress {
  elapsedMs: number;
  /** Stock pieces (offcuts included) of the whole plan as it stands: every material and thickness. */
  piecesUsed: number;
  /** Part area / stock area of those pieces, as the plan's totals count it. */
  yield: number;
  cost: number;
}

export interface OptimizeOptions {
  onProgress?: (progress: OptimizeProgress) => void;
  /** Aborting stops the search: optimize resolves with the best plan so far (every part still placed or reported). */
  signal?: AbortSignal;
  /** Another packer with the same contract (benchmarks); defaults to Kerfwise's `packGuillotine`. */
  pack?: PackFn;
}

/** Bin priorities (lower is used first when it costs no more). */
const PRIORITY = { offcut: 0, onHand: 1, buy: 2 } as const;

interface Instance {
  part: NestPart;
  instance: number;
}

const describeStock = (p: Pick<NestPart, 'thickness' | 'material'>) => `${p.thickness} mm ${p.material}`;

function unplacedMessage(reason: UnplacedReason, inst: Instance, canRotate: boolean): string {
  const { part } = inst;
  const size = `${part.length} × ${part.width} mm`;
  switch (reason) {
    case 'too-large':
      return `"${part.label || part.id}" (${size}) is larger than any ${describeStock(part)} stock${canRotate ? ', even turned' : ''}`;
    case 'grain':
      return `"${part.label || part.id}" (${size}) fits only turned across the grain, which its grain rule forbids`;
    case 'no-stock-left':
      return `not enough ${describeStock(part)}: the stock on hand is used up and no size that fits can be bought`;
    case 'no-stock':
      return `there is no ${describeStock(part)} in the stock room or to buy`;
  }
}

const unplaced = (inst: Instance, reason: UnplacedReason, canRotate: boolean): Unplaced => ({
  partId: inst.part.id,
  instance: inst.instance,
  label: inst.part.label,
  reason,
  message: unplacedMessage(reason, inst, canRotate),
});

/** Item leaves renumbered from pack item ids to placement indexes. */
function renumber(node: CutNode, index: Map<number, number>): CutNode {
  if (node.type === 'item') return { ...node, itemId: index.get(node.itemId) ?? -1 };
  if (node.type === 'leftover') return node;
  return { ...node, children: node.children.map((c) => renumber(c, index)) as [CutNode] | [CutNode, CutNode] };
}

interface Group {
  instances: Instance[];
  stocks: NestStock[];
  items: PackItem[];
  bins: BinType[];
  canRotate: boolean[];
}

/** `used`: pieces of each stock id taken by earlier groups (a stock within 0.01 mm of two part thicknesses). */
function prepareGroup(parts: NestPart[], request: NestRequest, used: Map<string, number>): Group {
  const { settings } = request;
  // Stock with none left stays in, so a part that fits only used-up stock is reported `no-stock-left`.
  const left = (s: NestStock) => (s.count === null ? null : Math.max(0, s.count - (used.get(s.id) ?? 0)));
  const stocks = stockForPart(parts[0], request.stock, settings);
  const instances = parts.flatMap((part) => Array.from({ length: part.quantity }, (_, k) => ({ part, instance: k + 1 })));
  const canRotate = instances.map(({ part }) => mayTurnInGroup(part, stocks));
  const items = instances.map(({ part }, id) => ({ id, w: part.length, h: part.width, canRotate: canRotate[id] }));
  const bins = stocks.map((s, id) => {
    const u = usableRect(s, trimFor(s, settings));
    const priority = s.kind === 'offcut' && settings.preferOffcuts ? PRIORITY.offcut : s.count !== null ? PRIORITY.onHand : PRIORITY.buy;
    return { id, w: u.w, h: u.h, count: left(s), cost: s.costEach, priority };
  });
  return { instances, stocks, items, bins, canRotate };
}

function piecesFromResult(group: Group, result: PackResult, request: NestRequest, firstIndex: number): PlanPiece[] {
  const { settings } = request;
  return result.bins.map((bin, b) => {
    const stock = group.stocks[bin.binTypeId];
    const t = trimFor(stock, settings);
    const index = new Map(bin.items.map((it, i) => [it.itemId, i]));
    const placements: Placement[] = bin.items.map((it) => {
      const { part, instance } = group.instances[it.itemId];
      return { partId: part.id, instance, label: part.label, x: it.rect.x + t, y: it.rect.y + t, w: it.rect.w, h: it.rect.h, rotated: it.rotated };
    });
    const usable = usableRect(stock, t);
    const packed = translateTree(renumber(bin.tree, index), t, t);
    // Trust but check: a malformed tree from the core (or one with too many stages for strips) is replaced by the
    // canonical tree rebuilt from the placements.
    const rule = stageRule(settings);
    const sound = checkTree(packed, usable, placements).length === 0 && countStages(packed, rule.firstAxis) <= rule.maxStages;
    const tree = sound ? packed : findGuillotineTree(usable, placements, settings.kerf, rule.maxStages, rule.firstAxis);
    return assemblePiece(stock, firstIndex + b, placements, tree, request);
  });
}

/** Parts not in any bin and not reported by the core are reported here: none is ever dropped. */
function unplacedFromResult(group: Group, result: PackResult): Unplaced[] {
  const out = result.unplaced.map((u) => unplaced(group.instances[u.itemId], u.reason, group.canRotate[u.itemId]));
  const accounted = new Set([...result.unplaced.map((u) => u.itemId), ...result.bins.flatMap((b) => b.items.map((i) => i.itemId))]);
  group.instances.forEach((inst, id) => {
    if (!accounted.has(id)) out.push(unplaced(inst, 'no-stock-left', group.canRotate[id]));
  });
  return out;
}

/** Stock pieces, their area, the part area on them and their cost: what progress reports. */
interface Measure {
  pieces: number;
  stockArea: number;
  partArea: number;
  cost: number;
}
const NOTHING: Measure = { pieces: 0, stockArea: 0, partArea: 0, cost: 0 };
const addMeasures = (a: Measure, b: Measure): Measure => ({
  pieces: a.pieces + b.pieces,
  stockArea: a.stockArea + b.stockArea,
  partArea: a.partArea + b.partArea,
  cost: a.cost + b.cost,
});

/** Stock area, part area and cost of packed bins, for progress. */
function measure(group: Group, result: PackResult): Measure {
  let stockArea = 0;
  let partArea = 0;
  let cost = 0;
  for (const bin of result.bins) {
    const s = group.stocks[bin.binTypeId];
    stockArea += s.length * s.width;
    cost += s.costEach;
    for (const it of bin.items) partArea += area(it.rect);
  }
  return { pieces: result.bins.length, stockArea, partArea, cost };
}

/**
 * The packing core's style for a stage rule: any number of stages is `panel`; a limit is kept with the core's strips
 * (3 stages, the first along y), which keeps within 3 or 4 stages; a limit of 2 packs with `packTwoStage`.
 */
const packStyle = (rule: StageRule): CuttingStyle => (rule.maxStages === Infinity ? 'panel' : 'strips');

const transposeRect = <R extends { x: number; y: number; w: number; h: number }>(r: R): R => ({ ...r, x: r.y, y: r.x, w: r.h, h: r.w });
function transposeTree(node: CutNode): CutNode {
  if (node.type !== 'cut') return { ...node, rect: transposeRect(node.rect) };
  return {
    ...node,
    rect: transposeRect(node.rect),
    axis: node.axis === 'x' ? 'y' : 'x',
    children: node.children.map(transposeTree) as [CutNode] | [CutNode, CutNode],
  };
}

/**
 * A packer that keeps the stage rule's first direction: crosscuts first is the core's strips packing of the mirrored
 * problem (x and y swapped: the core's rips become crosscuts), mirrored back. A part's turn is the same either way.
 */
function ruledPack(pack: PackFn, rule: StageRule): PackFn {
  if (rule.maxStages === Infinity || rule.firstAxis !== 'x') return pack;
  return async (items, bins, options) => {
    const mirrored = await pack(
      items.map((it) => ({ ...it, w: it.h, h: it.w })),
      bins.map((b) => ({ ...b, w: b.h, h: b.w })),
      { ...options, onProgress: options.onProgress && ((p) => options.onProgress!({ ...p, best: mirrorResult(p.best) })) },
    );
    return mirrorResult(mirrored);
  };
}
const mirrorResult = (r: PackResult): PackResult => ({
  ...r,
  bins: r.bins.map((b) => ({ ...b, items: b.items.map((it) => ({ ...it, rect: transposeRect(it.rect) })), tree: transposeTree(b.tree) })),
});

/**
 * Nests the request's parts onto its stock. Resolves with a plan (`version: 1`) in which every part instance is
 * placed or listed in `unplaced` with its reason. Throws a ZodError when the request does not parse.
 */
export async function optimize(requestInput: NestRequestInput, options: OptimizeOptions = {}): Promise<Plan> {
  const request = nestRequestSchema.parse(requestInput);
  const { settings } = request;
  const t0 = performance.now();
  let itemsLeft = request.parts.reduce((n, p) => n + p.quantity, 0);
  const used = new Map<string, number>();
  const groups = groupParts(request.parts);
  const rule = stageRule(settings);
  const packOptions = { kerf: settings.kerf, style: packStyle(rule), objective: settings.objective, seed: settings.seed };
  // Two stages: exact-width strips (the core's strips allow a third, trim stage).
  const pack = ruledPack(rule.maxStages === 2 ? packTwoStage : (options.pack ?? packGuillotine), rule);
  // Progress speaks for the whole plan it will return: every group counts from the start, first by a quick first
  // plan, then by its best as it is searched, then by its result.
  const estimates: Measure[] = [];
  if (options.onProgress) {
    for (const parts of groups) {
      const group = prepareGroup(parts, request, used);
      estimates.push(group.bins.length ? measure(group, await pack(group.items, group.bins, { ...packOptions, timeBudgetMs: 0 })) : NOTHING);
    }
  }
  const done = { ...NOTHING };
  const report = progressReporter(options.onProgress, t0, done, estimates);

  const pieces: PlanPiece[] = [];
  const notPlaced: Unplaced[] = [];
  for (const [g, parts] of groups.entries()) {
    const group = prepareGroup(parts, request, used);
    if (group.bins.length === 0) {
      itemsLeft -= group.items.length;
      // Stock of this material that trim leaves no room on is still stock: its parts are too large for it.
      const any = request.stock.some((s) => sameStock(s, group.instances[0].part));
      notPlaced.push(...group.instances.map((inst) => unplaced(inst, any ? 'too-large' : 'no-stock', false)));
      continue;
    }
    // Each group gets its share of the time still left, so time a quick group did not need goes to the next.
    const timeLeft = Math.max(0, settings.timeBudgetMs - (performance.now() - t0));
    const budget = options.signal?.aborted ? 0 : Math.round((timeLeft * group.items.length) / itemsLeft);
    itemsLeft -= group.items.length;
    const result = await pack(group.items, group.bins, {
      ...packOptions,
      timeBudgetMs: budget,
      signal: options.signal,
      onProgress: options.onProgress && ((p) => report(g, measure(group, p.best))),
    });
    const groupPieces = piecesFromResult(group, result, request, pieces.length);
    for (const p of groupPieces) used.set(p.stockId, (used.get(p.stockId) ?? 0) + 1);
    pieces.push(...groupPieces);
    notPlaced.push(...unplacedFromResult(group, result));
    Object.assign(done, addMeasures(done, measure(group, result)));
    report(g);
  }
  return assemblePlan(request, pieces, notPlaced, options.signal?.aborted ?? false);
}

/**
 * Progress for the whole plan: the groups done, the best so far of the group being searched, and the first-plan
 * estimate of every group still to come.
 */
function progressReporter(onProgress: OptimizeOptions['onProgress'], t0: number, done: Measure, estimates: Measure[]) {
  return (current: number, best: Measure = NOTHING) => {
    const whole = [done, best, ...estimates.slice(current + 1)].reduce(addMeasures, NOTHING);
    onProgress?.({
      elapsedMs: performance.now() - t0,
      piecesUsed: whole.pieces,
      yield: whole.stockArea > 0 ? whole.partArea / whole.stockArea : 0,
      cost: whole.cost,
    });
  };
}
