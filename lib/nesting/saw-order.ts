/**
 * The saw order: a cut tree turned into numbered rips and crosscuts the way a person makes them, and the replay that
 * checks a saw order against the stock piece (`validatePlan`).
 *
 * Pieces are named: the stock piece is "A" (then "B", … "Z", "AA"), a piece cut from one whose name ends in a
 * letter gets a number ("A1", "A2"), from one ending in a number a letter ("A1a", "A1b"). The piece being cut down
 * keeps its name until its last cut, as a sheet stays "sheet A" while strips come off it. Each step's fence setting
 * is the width of the piece between blade and fence; waste never goes there, so it falls off the free side.
 */
import { contains, type Rect } from '@/lib/geometry/rect';
import type { CutNode } from '@/lib/nesting/pack/types';
import { extent, highEdge, lowEdge, otherAxis as other, sameRect, slice, type Axis } from '@/lib/geometry/axis';
import { EPS } from '@/lib/nesting/guillotine';
import { cutProblems } from '@/lib/nesting/saw-profile';
import type { Placement, SawPiece, SawStep } from '@/shared/schemas/nesting';
import type { NestSaw } from '@/shared/schemas/saw';

/** "A", "B", … "Z", "AA", "AB", … (bijective base 26). */
export function letters(n: number, upper = true): string {
  let s = '';
  for (let k = n + 1; k > 0; k = Math.floor((k - 1) / 26)) s = String.fromCharCode((upper ? 65 : 97) + ((k - 1) % 26)) + s;
  return s;
}

export const stockPieceName = (index: number) => letters(index);

/** The k-th (1-based) piece cut from `name`. */
export const childName = (name: string, k: number) => (/\d$/.test(name) ? name + letters(k - 1, false) : name + String(k));

export interface SawContext {
  kerf: number;
  /** The usable (trimmed) area: cuts wholly outside it are trim cuts. */
  usable: Rect;
  placements: readonly Placement[];
  minOffcutLength: number;
  minOffcutWidth: number;
  /** The narrowest piece a rip may leave between blade and fence (0: no limit); with saws, each saw's own. */
  minFenceWidth: number;
  /** The request's saws, the one preferred for each cut first (`requestSaws`): each step names the saw it is made on. */
  saws?: readonly NestSaw[];
}

const axisOf = (kind: SawStep['kind']): Axis => (kind === 'rip' ? 'y' : 'x');
const nonEmpty = (r: Rect) => r.w > EPS && r.h > EPS;

/** Keep-worthy when both sides reach the minimum offcut size (longer side vs length, shorter vs width). */
export const isKeepable = (r: Rect, minLength: number, minWidth: number) =>
  Math.max(r.w, r.h) >= minLength - EPS && Math.min(r.w, r.h) >= minWidth - EPS && nonEmpty(r);

function describe(rect: Rect, node: CutNode | null, ctx: SawContext, name: string): SawPiece {
  const parts = ctx.placements.filter((p) => contains(rect, p, EPS)).map((p) => ({ partId: p.partId, instance: p.instance }));
  const role: SawPiece['role'] =
    node?.type === 'item'
      ? 'part'
      : node?.type === 'leftover'
        ? isKeepable(rect, ctx.minOffcutLength, ctx.minOffcutWidth)
          ? 'offcut'
          : 'waste'
        : 'piece';
  return { name, x: rect.x, y: rect.y, w: rect.w, h: rect.h, role, parts };
}

/** The leaves and cut positions of the run of same-direction cuts starting at `node`, low to high. */
function flattenRun(node: Extract<CutNode, { type: 'cut' }>): { leaves: CutNode[]; cuts: number[] } {
  const leaves: CutNode[] = [];
  const cuts: number[] = [];
  const walk = (n: CutNode) => {
    if (n.type === 'cut' && n.axis === node.axis) {
      walk(n.children[0]);
      cuts.push(n.pos);
      if (n.children[1]) walk(n.children[1]);
    } else leaves.push(n);
  };
  walk(node);
  return { leaves, cuts };
}

/**
 * Numbered steps that cut `tree` (in stock coordinates, trim cuts included) into its leaves. Order: all cuts of one
 * direction on a piece (e.g. every rip of the sheet), then each resulting piece in turn, low side first.
 */
export function sawOrderFromTree(tree: CutNode, rootName: string, ctx: SawContext): SawStep[] {
  const steps: SawStep[] = [];
  const visit = (node: CutNode, name: string) => {
    if (node.type !== 'cut') return;
    const { leaves, cuts } = flattenRun(node);
    const names = cutRun(node, name, leaves, cuts, ctx, steps);
    leaves.forEach((leaf, i) => {
      const leafName = names[i];
      if (leafName) visit(leaf, leafName);
    });
  };
  visit(tree, rootName);
  return steps;
}

/** One cut of a run on the piece `cur`: where the blade goes and the named sides it leaves. */
interface RunCut {
  axis: Axis;
  pos: number;
  cur: Rect;
  lowName: string | null;
  highName: string | null;
  produces: SawPiece[];
}

type Reference = SawStep['reference'];

/**
 * Steps for one run of same-direction cuts on piece `name`, pushed onto `steps`; returns the names of the run's
 * leaves (null for a side the blade takes whole). The piece cut down keeps its name until the run's last cut.
 */
function cutRun(
  node: Extract<CutNode, { type: 'cut' }>,
  name: string,
  leaves: CutNode[],
  cuts: number[],
  ctx: SawContext,
  steps: SawStep[],
): (string | null)[] {
  const axis = node.axis;
  const names: (string | null)[] = [];
  let k = 0;
  let cur = node.rect;
  cuts.forEach((pos, i) => {
    const a1 = highEdge(cur, axis);
    const low = slice(cur, axis, lowEdge(cur, axis), Math.max(lowEdge(cur, axis), pos));
    const high = slice(cur, axis, Math.min(a1, pos + ctx.kerf), a1);
    const isLast = i === cuts.length - 1;
    const lowName = nonEmpty(low) ? childName(name, ++k) : null;
    names[i] = lowName;
    const highLeaf = isLast ? (leaves[i + 1] ?? null) : null;
    const highName = !nonEmpty(high) ? null : isLast ? childName(name, ++k) : name;
    if (isLast) names[i + 1] = highName;
    const produces: SawPiece[] = [];
    if (lowName) produces.push(describe(low, leaves[i], ctx, lowName));
    if (highName) produces.push(describe(high, isLast ? highLeaf : null, ctx, highName));
    if (produces.length === 0) return; // a blade wider than the piece: nothing to do
    steps.push(sawStep({ axis, pos, cur, lowName, highName, produces }, name, steps.length + 1, ctx));
    cur = high;
  });
  return names;
}

/** Step `n`: the cut `c` of piece `name`, with the side on the fence, the saw it is made on and whether it is trim. */
function sawStep(c: RunCut, name: string, n: number, ctx: SawContext): SawStep {
  const kind: SawStep['kind'] = c.axis === 'y' ? 'rip' : 'crosscut';
  const length = extent(c.cur, other(c.axis));
  const preferred = preferredReference(c);
  const { reference, narrow, saw } = ctx.saws?.length
    ? onFirstAbleSaw(c, ctx, ctx.saws, preferred, kind, length)
    : { ...fenceSide(c, ctx.kerf, preferred, ctx.minFenceWidth), saw: undefined };
  const trim = c.pos + ctx.kerf <= lowEdge(ctx.usable, c.axis) + EPS || c.pos >= highEdge(ctx.usable, c.axis) - EPS;
  return {
    n,
    kind,
    piece: name,
    reference,
    fence: fenceFor(c, ctx.kerf, reference),
    length,
    trim,
    ...(narrow ? { narrow } : {}),
    ...(saw ? { saw } : {}),
    produces: c.produces,
  };
}

/** The width between blade and fence with side `ref` against the fence. */
const fenceFor = (c: RunCut, kerf: number, ref: Reference) =>
  ref === 'low' ? c.pos - lowEdge(c.cur, c.axis) : highEdge(c.cur, c.axis) - (c.pos + kerf);

const sideExists = (c: RunCut, ref: Reference) => (ref === 'low' ? c.lowName !== null : c.highName !== null);

const turnedFrom = (ref: Reference): Reference => (ref === 'low' ? 'high' : 'low');

/** The side that rides the fence when safety allows: the low side, unless it is missing or waste (waste falls free). */
function preferredReference(c: RunCut): Reference {
  const lowIsWaste = c.lowName !== null && c.produces[0].role === 'waste';
  return !c.lowName || (lowIsWaste && c.highName) ? 'high' : 'low';
}

/**
 * The side on the fence for a saw whose safe minimum is `minFence`. A rip never traps a strip narrower than that
 * between blade and fence: the piece is turned so the narrow side falls free (safety before the rule that waste does
 * not ride the fence), or, when both sides are narrow, the step is one for a sled, a track saw or a band saw.
 */
function fenceSide(c: RunCut, kerf: number, preferred: Reference, minFence: number) {
  const turned = turnedFrom(preferred);
  let reference = preferred;
  let narrow = false;
  if (c.axis === 'y' && fenceFor(c, kerf, reference) < minFence - EPS) {
    if (sideExists(c, turned) && fenceFor(c, kerf, turned) >= minFence - EPS) reference = turned;
    else narrow = true;
  }
  return { reference, narrow };
}

/**
 * The first saw (and way round) that can make the cut: the second saw before the breakdown saw, the preferred edge
 * on the fence before the other. When none can, the first saw's choice stands (validatePlan reports it).
 */
function onFirstAbleSaw(c: RunCut, ctx: SawContext, saws: readonly NestSaw[], preferred: Reference, kind: SawStep['kind'], length: number) {
  const turned = turnedFrom(preferred);
  const tries = saws.flatMap((sw) => {
    const safe = (r: Reference) => sideExists(c, r) && fenceFor(c, ctx.kerf, r) >= sw.minFenceWidth - EPS;
    const noSafeSide = c.axis === 'y' && !safe('low') && !safe('high');
    const first = fenceSide(c, ctx.kerf, preferred, sw.minFenceWidth).reference;
    return [...new Set<Reference>([first, preferred, turned])].filter((r) => sideExists(c, r)).map((r) => ({ sw, reference: r, narrow: noSafeSide }));
  });
  const ok =
    tries.find((t) => cutProblems(t.sw, { kind, fence: fenceFor(c, ctx.kerf, t.reference), length, narrow: t.narrow }, c.cur).length === 0) ??
    tries[0];
  const { reference, narrow } = ok ?? fenceSide(c, ctx.kerf, preferred, ctx.minFenceWidth);
  return { reference, narrow, saw: (ok?.sw ?? saws[0]).name };
}

export interface ReplayProblem {
  step?: number;
  message: string;
}

/**
 * Replays a saw order from the whole stock piece: every step must be a through-cut of a piece that exists at that
 * moment, producing the pieces it says. Returns the pieces left at the end (by name) and what went wrong.
 */
export function replaySawOrder(steps: readonly SawStep[], stock: Rect, rootName: string, kerf: number) {
  const pieces = new Map<string, Rect>([[rootName, stock]]);
  const problems: ReplayProblem[] = [];
  /** The piece each step cuts, as it is when the step begins (undefined when it does not exist). */
  const cutFrom: (Rect | undefined)[] = [];
  steps.forEach((step, i) => {
    const n = i + 1;
    if (step.n !== n) problems.push({ step: n, message: `step ${n} is numbered ${step.n}` });
    const cur = pieces.get(step.piece);
    cutFrom.push(cur);
    if (!cur) {
      problems.push({ step: n, message: `step ${n} cuts piece "${step.piece}", which does not exist at that point` });
      return;
    }
    const axis = axisOf(step.kind);
    const a0 = lowEdge(cur, axis);
    const a1 = highEdge(cur, axis);
    const pos = step.reference === 'low' ? a0 + step.fence : a1 - step.fence - kerf;
    if (pos >= a1 - EPS || pos + kerf <= a0 + EPS) {
      problems.push({ step: n, message: `step ${n}: a fence of ${step.fence} mm puts the blade outside piece "${step.piece}"` });
      return;
    }
    if (Math.abs(step.length - extent(cur, other(axis))) > EPS) {
      problems.push({
        step: n,
        message: `step ${n}: a through-cut of piece "${step.piece}" is ${extent(cur, other(axis))} mm long, not ${step.length}`,
      });
    }
    const sides = [slice(cur, axis, a0, Math.max(a0, pos)), slice(cur, axis, Math.min(a1, pos + kerf), a1)].filter(nonEmpty);
    const said = step.produces;
    const matches = said.length === sides.length && sides.every((s, j) => sameRect(s, said[j], EPS));
    if (!matches) problems.push({ step: n, message: `step ${n}: the pieces it lists are not what this cut leaves` });
    pieces.delete(step.piece);
    sides.forEach((s, j) => {
      const name = said[j]?.name ?? `${step.piece}?${n}.${j}`;
      if (pieces.has(name)) problems.push({ step: n, message: `step ${n}: piece name "${name}" is already in use` });
      pieces.set(name, s);
    });
  });
  return { pieces, problems, cutFrom };
}
