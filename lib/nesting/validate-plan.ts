/**
 * `validatePlan`: the one judge of a plan, whoever made it (the engine, the layout bench, a saved file).
 *
 * Rules it enforces, beyond the schema:
 * - Parts lie inside the trimmed stock, at their own size (length along x unless rotated), on stock of their
 *   material and thickness, and a part whose grain must run along its length is turned only on grainless stock.
 * - Two parts on one piece need at least one kerf of clear space between them along x or along y. Touching edges
 *   (or corners) count as an overlap when the kerf is above 0: the blade has to pass between them.
 * - Straight through-cuts must separate the layout (rebuilt from the bare placements); `strips` allows 3 stages,
 *   the first being rips. This check is skipped on a piece that already has overlaps or parts outside.
 * - Every part instance 1..quantity is placed or listed as unplaced, exactly once, and an unplaced part's reason
 *   is true of the request's stock; stock on hand is not overdrawn.
 * - When present, the cut tree is well formed and the saw order, replayed from the whole stock piece, cuts every
 *   part free exactly.
 */
import { contains } from '@/lib/geometry/rect';
import { EPS, findGuillotineTree } from '@/lib/nesting/guillotine';
import { cutProblems, requestSaws, sawStageRule, stageRule, stepStages } from '@/lib/nesting/saw-profile';
import { sameRect } from '@/lib/geometry/axis';
import { checkTree } from '@/lib/nesting/cut-tree';
import { replaySawOrder, stockPieceName } from '@/lib/nesting/saw-order';
import { fitsOn, mayTurnInGroup, rotationAllowed, sameStock, stockForPart, stockRect, trimFor, usableRect } from '@/lib/nesting/stock-rules';
import {
  nestRequestSchema,
  planSchema,
  type NestPart,
  type NestRequest,
  type NestRequestInput,
  type Placement,
  type PlanPiece,
  type Unplaced,
} from '@/shared/schemas/nesting';

export type ViolationCode =
  | 'invalid-request'
  | 'invalid-plan'
  | 'unknown-stock'
  | 'stock-mismatch'
  | 'unknown-part'
  | 'extra-part'
  | 'missing-part'
  | 'duplicate-part'
  | 'size-mismatch'
  | 'material-mismatch'
  | 'grain'
  | 'outside-stock'
  | 'overlap'
  | 'not-guillotine'
  | 'too-many-stages'
  | 'stock-count'
  | 'unplaced-reason'
  | 'tree'
  | 'saw-order'
  | 'unsafe-fence'
  | 'first-stage'
  | 'rip-capacity'
  | 'crosscut-capacity'
  | 'saw-piece-too-large'
  | 'saw-kerf'
  | 'unknown-saw';

export interface Violation {
  code: ViolationCode;
  message: string;
  /** Index of the stock piece in `plan.pieces`. */
  piece?: number;
  partId?: string;
  instance?: number;
  /** Saw-order step number. */
  step?: number;
  /** The other part of a pair (an overlap names both: `partId`/`instance` is the second, this the first). */
  other?: { partId: string; instance: number };
}

const name = (part: NestPart | undefined, p: { partId: string; instance: number }) => `"${part?.label || p.partId}" #${p.instance}`;

function zodViolations(code: ViolationCode, issues: { path: PropertyKey[]; message: string }[]): Violation[] {
  return issues.map((i) => ({ code, message: `${i.path.map(String).join('.') || '(root)'}: ${i.message}` }));
}

/** Clear space between two parts along x or y, or the largest of the two gaps (negative when they overlap). */
function clearance(a: Placement, b: Placement): number {
  const gx = Math.max(b.x - (a.x + a.w), a.x - (b.x + b.w));
  const gy = Math.max(b.y - (a.y + a.h), a.y - (b.y + b.h));
  return Math.max(gx, gy);
}

/** A stock piece of the plan judged alone: the stock it claims, where its parts lie, its cuts and its saw order. */
function checkPiece(piece: PlanPiece, index: number, request: NestRequest, parts: Map<string, NestPart>): Violation[] {
  const { settings } = request;
  const stock = request.stock.find((s) => s.id === piece.stockId);
  const trim = stock ? trimFor(stock, settings) : piece.trim;
  const usable = usableRect(piece, trim);
  const placed = placementProblems(piece, index, parts, stock, usable, trim);
  const spacing = spacingProblems(piece, index, parts, settings.kerf);
  // The cuts are judged only on a piece whose parts lie inside it, at their size and apart.
  const geometryOk = placed.geometryOk && spacing.length === 0;
  return [
    ...stockProblems(piece, index, stock, settings),
    ...placed.violations,
    ...spacing,
    ...(geometryOk ? stageProblems(piece, index, usable, settings) : []),
    ...treeProblems(piece, index),
    ...(piece.sawOrder ? sawOrderProblems(piece, piece.sawOrder, index, parts, settings) : []),
  ];
}

type Stock = NestRequest['stock'][number];
type Settings = NestRequest['settings'];

/** The piece is the request's stock it names: same kind, size, material, thickness and trim. */
function stockProblems(piece: PlanPiece, index: number, stock: Stock | undefined, settings: Settings): Violation[] {
  const at = { piece: index };
  if (!stock) return [{ code: 'unknown-stock', message: `piece ${index + 1} uses stock "${piece.stockId}", which is not in the request`, ...at }];
  const same =
    stock.kind === piece.kind &&
    Math.abs(stock.length - piece.length) <= EPS &&
    Math.abs(stock.width - piece.width) <= EPS &&
    sameStock(stock, piece) &&
    Math.abs(trimFor(stock, settings) - piece.trim) <= EPS;
  if (same) return [];
  return [
    { code: 'stock-mismatch', message: `piece ${index + 1} does not match stock "${stock.id}" (kind, size, material, thickness or trim)`, ...at },
  ];
}

/** Each part at its own size, on its material, turned only where its grain allows, inside the trimmed piece. */
function placementProblems(
  piece: PlanPiece,
  index: number,
  parts: Map<string, NestPart>,
  stock: Stock | undefined,
  usable: ReturnType<typeof usableRect>,
  trim: number,
): { violations: Violation[]; geometryOk: boolean } {
  const out: Violation[] = [];
  let geometryOk = true;
  for (const p of piece.placements) {
    const part = parts.get(p.partId);
    const where = { piece: index, partId: p.partId, instance: p.instance };
    if (part) {
      const [w, h] = p.rotated ? [part.width, part.length] : [part.length, part.width];
      if (Math.abs(p.w - w) > EPS || Math.abs(p.h - h) > EPS) {
        out.push({
          code: 'size-mismatch',
          message: `${name(part, p)} is placed as ${p.w} × ${p.h} mm but is ${w} × ${h} mm${p.rotated ? ' turned' : ''}`,
          ...where,
        });
        geometryOk = false;
      }
      if (!sameStock(part, piece)) {
        out.push({
          code: 'material-mismatch',
          message: `${name(part, p)} is ${part.thickness} mm ${part.material}, placed on ${piece.thickness} mm ${piece.material}`,
          ...where,
        });
      }
      if (p.rotated && !rotationAllowed(part, { grain: stock?.grain ?? 'along-length' })) {
        out.push({ code: 'grain', message: `${name(part, p)} is turned across the grain, but its grain must run along its length`, ...where });
      }
    }
    if (!contains(usable, p, EPS)) {
      out.push({
        code: 'outside-stock',
        message: `${name(part, p)} lies outside the usable area of piece ${index + 1} (after ${trim} mm trim)`,
        ...where,
      });
      geometryOk = false;
    }
  }
  return { violations: out, geometryOk };
}

/** Every two parts at least one kerf apart along x or y (a sweep along x finds the pairs close enough to judge). */
function spacingProblems(piece: PlanPiece, index: number, parts: Map<string, NestPart>, kerf: number): Violation[] {
  const out: Violation[] = [];
  const byX = [...piece.placements].sort((a, b) => a.x - b.x);
  for (let i = 0; i < byX.length; i++) {
    for (let j = i + 1; j < byX.length && byX[j].x < byX[i].x + byX[i].w + kerf - EPS; j++) {
      const [a, b] = [byX[i], byX[j]];
      const gap = clearance(a, b);
      if (gap >= kerf - EPS) continue;
      const what = gap < -EPS ? 'overlap' : `are ${Math.max(0, gap).toFixed(2)} mm apart, closer than one kerf (${kerf} mm)`;
      out.push({
        code: 'overlap',
        message: `${name(parts.get(a.partId), a)} and ${name(parts.get(b.partId), b)} ${what}`,
        piece: index,
        partId: b.partId,
        instance: b.instance,
        other: { partId: a.partId, instance: a.instance },
      });
    }
  }
  return out;
}

/**
 * The layout comes apart with straight through-cuts, in as many stages as the saw takes and starting the way it
 * does. With a breakdown saw the stages are judged on the saw order (each saw's own, from the piece it is handed);
 * with one saw or none, on the canonical tree of the bare placements.
 */
function stageProblems(piece: PlanPiece, index: number, usable: ReturnType<typeof usableRect>, settings: Settings): Violation[] {
  const at = { piece: index };
  const rule = settings.breakdownSaw ? { maxStages: Infinity } : stageRule(settings);
  if (findGuillotineTree(usable, piece.placements, settings.kerf, rule.maxStages, rule.firstAxis)) return [];
  const anyTree = rule.maxStages !== Infinity && findGuillotineTree(usable, piece.placements, settings.kerf);
  const otherWay =
    anyTree && rule.firstAxis && findGuillotineTree(usable, piece.placements, settings.kerf, rule.maxStages, rule.firstAxis === 'y' ? 'x' : 'y');
  const who = settings.saw ? settings.saw.name : 'strip cutting';
  const first = rule.firstAxis === 'y' ? 'rips' : 'crosscuts';
  if (otherWay)
    return [
      {
        code: 'first-stage',
        message: `piece ${index + 1} can be cut in ${rule.maxStages} stages only with ${first === 'rips' ? 'crosscuts' : 'rips'} first, but ${who} starts with ${first}`,
        ...at,
      },
    ];
  if (anyTree)
    return [
      { code: 'too-many-stages', message: `piece ${index + 1} needs more than ${rule.maxStages} stages of cuts (${first} first) for ${who}`, ...at },
    ];
  return [{ code: 'not-guillotine', message: `piece ${index + 1} cannot be cut apart with straight through-cuts`, ...at }];
}

/** The cut tree, when the plan carries one, is well formed over the whole piece. */
function treeProblems(piece: PlanPiece, index: number): Violation[] {
  if (!piece.tree) return [];
  return checkTree(piece.tree, stockRect(piece), piece.placements).map((t) => ({
    code: 'tree',
    message: `piece ${index + 1}: ${t.message}`,
    piece: index,
  }));
}

type SawOrder = NonNullable<PlanPiece['sawOrder']>;

/** The saw order, replayed from the whole piece: each step one its saw can make, and every part cut free exactly once. */
function sawOrderProblems(piece: PlanPiece, sawOrder: SawOrder, index: number, parts: Map<string, NestPart>, settings: Settings): Violation[] {
  const at = { piece: index };
  const { pieces, problems, cutFrom } = replaySawOrder(sawOrder, stockRect(piece), stockPieceName(index), settings.kerf);
  const out: Violation[] = problems.map((pr) => ({ code: 'saw-order', message: `piece ${index + 1}: ${pr.message}`, ...at, step: pr.step }));
  out.push(...stepProblems(sawOrder, index, cutFrom, settings));
  const finals = [...pieces.values()];
  for (const p of piece.placements) {
    const hits = finals.filter((f) => sameRect(f, p, EPS)).length;
    if (hits !== 1) {
      out.push({
        code: 'saw-order',
        message: `piece ${index + 1}: the saw order does not cut ${name(parts.get(p.partId), p)} free at its place`,
        ...at,
        partId: p.partId,
        instance: p.instance,
      });
    }
  }
  return out;
}

/**
 * Each step on its saw: without saws in the request, a rip keeps the shop's safe fence width; with them, the step
 * names one, that saw can make it from the piece it is handed, and in no more stages than the saw is used with.
 */
function stepProblems(sawOrder: SawOrder, index: number, cutFrom: ReturnType<typeof replaySawOrder>['cutFrom'], settings: Settings): Violation[] {
  const out: Violation[] = [];
  const saws = requestSaws(settings);
  const stages = saws.length ? stepStages(sawOrder, stockPieceName(index), saws) : [];
  sawOrder.forEach((step, i) => {
    const where = { piece: index, step: step.n };
    if (!saws.length) {
      if (step.kind === 'rip' && !step.narrow && step.fence < settings.minFenceWidth - EPS) {
        out.push({
          code: 'unsafe-fence',
          message: `piece ${index + 1}, step ${step.n}: a rip with ${step.fence} mm between blade and fence, under the ${settings.minFenceWidth} mm safe minimum`,
          ...where,
        });
      }
      return;
    }
    const saw = saws.find((s) => s.name === step.saw);
    if (!saw) {
      out.push({
        code: 'unknown-saw',
        message: `piece ${index + 1}, step ${step.n}: ${step.saw ? `“${step.saw}” is not a saw of this nest` : 'the step does not say which saw makes it'}`,
        ...where,
      });
      return;
    }
    const from = cutFrom[i];
    if (from)
      for (const pr of cutProblems(saw, step, from))
        out.push({ code: pr.code, message: `piece ${index + 1}, step ${step.n}: ${pr.message}`, ...where });
    const limit = sawStageRule(saw).maxStages;
    if (stages[i] > limit) {
      out.push({
        code: 'too-many-stages',
        message: `piece ${index + 1}, step ${step.n}: stage ${stages[i]} of cuts on ${saw.name}, which is used with at most ${limit}`,
        ...where,
      });
    }
  });
  return out;
}

/**
 * Is the reason given for an unplaced part true? Judged on the request's stock (and, for `no-stock-left`, on what
 * the plan has used of it), with the packing rule for turning (`mayTurnInGroup`).
 */
function unplacedReasonProblem(u: Unplaced, part: NestPart, request: NestRequest, used: Map<string, number>): string | null {
  const { settings } = request;
  const stocks = stockForPart(part, request.stock, settings);
  const mayTurn = mayTurnInGroup(part, stocks);
  const fits = stocks.map((s) => ({ s, ...fitsOn(part, s, settings) }));
  const straight = fits.some((f) => f.straight);
  const turned = fits.some((f) => f.turned);
  const placeable = fits.filter((f) => f.straight || (mayTurn && f.turned));
  const anyOfMaterial = request.stock.some((s) => sameStock(s, part));
  switch (u.reason) {
    case 'no-stock':
      return anyOfMaterial ? `there is ${part.thickness} mm ${part.material} in the request` : null;
    case 'too-large':
      return straight || (mayTurn && turned) ? 'it fits some of the stock' : null;
    case 'grain':
      return straight || !turned || mayTurn ? 'turning is not what keeps it off the stock' : null;
    case 'no-stock-left': {
      if (placeable.length === 0) return 'no stock it fits on was ever available';
      const left = placeable.find((f) => f.s.count === null || (used.get(f.s.id) ?? 0) < f.s.count);
      return left ? `stock "${left.s.id}" it fits on is still available` : null;
    }
  }
}

/**
 * Every way `plan` breaks the rules for `request` (see the file comment); an empty list means the plan is valid.
 * Tree and saw order are optional on each piece: an edited plan is checked on its placements alone.
 */
export function validatePlan(requestInput: NestRequestInput, planInput: unknown): Violation[] {
  const req = nestRequestSchema.safeParse(requestInput);
  if (!req.success) return zodViolations('invalid-request', req.error.issues);
  const parsed = planSchema.safeParse(planInput);
  if (!parsed.success) return zodViolations('invalid-plan', parsed.error.issues);
  const request = req.data;
  const plan = parsed.data;
  const parts = new Map(request.parts.map((p) => [p.id, p]));
  const out: Violation[] = plan.pieces.flatMap((piece, i) => checkPiece(piece, i, request, parts));

  const seen = new Map<string, number>();
  const tally = (p: { partId: string; instance: number }, pieceIndex?: number) => {
    const part = parts.get(p.partId);
    const where = { partId: p.partId, instance: p.instance, ...(pieceIndex === undefined ? {} : { piece: pieceIndex }) };
    if (!part) out.push({ code: 'unknown-part', message: `part "${p.partId}" is not in the request`, ...where });
    else if (p.instance > part.quantity)
      out.push({ code: 'extra-part', message: `${name(part, p)} is more than the ${part.quantity} asked for`, ...where });
    else seen.set(`${p.partId}\u0000${p.instance}`, (seen.get(`${p.partId}\u0000${p.instance}`) ?? 0) + 1);
  };
  plan.pieces.forEach((piece, i) => piece.placements.forEach((p) => tally(p, i)));
  plan.unplaced.forEach((u) => tally(u));
  const used = new Map<string, number>();
  for (const p of plan.pieces) used.set(p.stockId, (used.get(p.stockId) ?? 0) + 1);
  for (const u of plan.unplaced) {
    const part = parts.get(u.partId);
    const problem = part && unplacedReasonProblem(u, part, request, used);
    if (problem)
      out.push({
        code: 'unplaced-reason',
        message: `${name(part, u)} is reported ${u.reason}, but ${problem}`,
        partId: u.partId,
        instance: u.instance,
      });
  }
  for (const part of request.parts) {
    for (let k = 1; k <= part.quantity; k++) {
      const n = seen.get(`${part.id}\u0000${k}`) ?? 0;
      const where = { partId: part.id, instance: k };
      if (n === 0) out.push({ code: 'missing-part', message: `${name(part, where)} is neither placed nor reported as unplaced`, ...where });
      if (n > 1) out.push({ code: 'duplicate-part', message: `${name(part, where)} appears ${n} times`, ...where });
    }
  }

  for (const saw of requestSaws(request.settings)) {
    if (request.settings.kerf < saw.kerf - EPS) {
      out.push({ code: 'saw-kerf', message: `the plan allows ${request.settings.kerf} mm per cut, but ${saw.name}’s kerf is ${saw.kerf} mm` });
    }
  }
  for (const s of request.stock) {
    const n = used.get(s.id) ?? 0;
    if (s.count !== null && n > s.count)
      out.push({ code: 'stock-count', message: `the plan uses ${n} of stock "${s.id}" but only ${s.count} are on hand` });
  }
  return out;
}
