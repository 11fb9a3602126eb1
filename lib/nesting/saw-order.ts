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
    const axis = node.axis;
    const { leaves, cuts } = flattenRun(node);
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
      const lowIsWaste = lowName !== null && produces[0].role === 'waste';
      const fenceFor = (ref: SawStep['reference']) => (ref === 'low' ? pos - lowEdge(cur, axis) : a1 - (pos + ctx.kerf));
      const preferred: SawStep['reference'] = !lowName || (lowIsWaste && highName) ? 'high' : 'low';
      const turned: SawStep['reference'] = preferred === 'low' ? 'high' : 'low';
      const turnedExists = turned === 'low' ? lowName !== null : highName !== null;
      const kind: SawStep['kind'] = axis === 'y' ? 'rip' : 'crosscut';
      const length = extent(cur, other(axis));
      // A rip never traps a strip narrower than the safe minimum between blade and fence: the piece is turned so
      // the narrow side falls free (safety before the rule that waste does not ride the fence), or, when both sides
      // are narrow, the step is one for a sled, a track saw or a band saw.
      const choose = (minFence: number) => {
        let reference = preferred;
        let narrow = false;
        if (axis === 'y' && fenceFor(reference) < minFence - EPS) {
          if (turnedExists && fenceFor(turned) >= minFence - EPS) reference = turned;
          else narrow = true;
        }
        return { reference, narrow };
      };
      let { reference, narrow } = choose(ctx.minFenceWidth);
      let saw: string | undefined;
      if (ctx.saws?.length) {
        // The first saw (and way round) that can make the cut: the second saw before the breakdown saw, the
        // preferred edge on the fence before the other. When none can, the first saw's choice stands (validatePlan
        // reports it).
        const exists = (r: SawStep['reference']) => (r === 'low' ? lowName !== null : highName !== null);
        const tries = ctx.saws.flatMap((sw) => {
          const safe = (r: SawStep['reference']) => exists(r) && fenceFor(r) >= sw.minFenceWidthMm - EPS;
          const noSafeSide = axis === 'y' && !safe('low') && !safe('high');
          const first = choose(sw.minFenceWidthMm).reference;
          return [...new Set<SawStep['reference']>([first, preferred, turned])].filter(exists).map((r) => ({ sw, reference: r, narrow: noSafeSide }));
        });
        const ok =
          tries.find((t) => cutProblems(t.sw, { kind, fence: fenceFor(t.reference), length, narrow: t.narrow }, cur).length === 0) ?? tries[0];
        if (ok) ({ reference, narrow } = ok);
        saw = (ok?.sw ?? ctx.saws[0]).name;
      }
      const trim = pos + ctx.kerf <= lowEdge(ctx.usable, axis) + EPS || pos >= highEdge(ctx.usable, axis) - EPS;
      steps.push({
        n: steps.length + 1,
        kind,
        piece: name,
        reference,
        fence: fenceFor(reference),
        length,
        trim,
        ...(narrow ? { narrow } : {}),
        ...(saw ? { saw } : {}),
        produces,
      });
      cur = high;
    });
    leaves.forEach((leaf, i) => {
      const leafName = names[i];
      if (leafName) visit(leaf, leafName);
    });
  };
  visit(tree, rootName);
  return steps;
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
