import { pieceBoardFeet } from './pricing';

export { pieceBoardFeet };

/** One stock size a plan uses, as the estimator reads it before quoting. */
export interface TakeoffSize {
  stockId: string;
  source: 'stock' | 'offcut' | 'buy';
  kind: 'sheet' | 'board' | 'offcut';
  material: string;
  nominalThickness: string;
  thickness: number;
  length: number;
  width: number;
  /** Pieces the plan lays parts on. */
  count: number;
  costEachCents: number;
  /** Free in the stock room now: on hand less every reservation (the Stock room's "free"). */
  free: number;
  /** Pieces of this size this plan already holds (reserved by its release). */
  heldByPlan: number;
}

export interface TakeoffLine extends TakeoffSize {
  /** Boards only: board feet of the pieces (on the nominal thickness for quartered stock). */
  boardFeet: number | null;
  areaMm2: number;
  costCents: number;
  /** The stock room can give the plan its pieces: free now plus what the plan already holds. */
  covered: boolean;
}

/**
 * The spoilage allowance for one material and thickness: extra material for parts spoiled at the saw and for
 * defects, taken once on the job's material (never per line), then rounded up to whole pieces to have ready.
 */
export interface MaterialAllowance {
  material: string;
  thickness: number;
  /** 'area' for sheet goods (mm²), 'boardFeet' for lumber. */
  measure: 'area' | 'boardFeet';
  /** The plan's material of this kind: stock pieces and offcuts. */
  amount: number;
  /** amount × the allowance fraction. */
  allowance: number;
  costCents: number;
  /** costCents × the allowance fraction, to the cent. */
  allowanceCents: number;
  /** The size extra pieces would be cut from: the plan's most used stock size (null when it uses only offcuts). */
  stockId: string | null;
  /** Stock pieces of that size the plan uses, and how many to have ready with the allowance (whole pieces). */
  pieces: number;
  piecesReady: number;
  /** The stock room has the pieces to have ready (free now plus what the plan holds). */
  coveredReady: boolean;
}

export interface Takeoff {
  lines: TakeoffLine[];
  allowances: MaterialAllowance[];
  totals: {
    costCents: number;
    allowanceCents: number;
    costWithAllowanceCents: number;
    boardFeet: number;
    areaMm2: number;
    covered: boolean;
    coveredReady: boolean;
  };
}

/** Whole pieces, with float crumbs (2.0000000001) not rounded up to another piece. */
const wholePiecesUp = (pieces: number) => Math.ceil(pieces - 1e-9);

function allowanceFor(group: TakeoffLine[], fraction: number): MaterialAllowance {
  const measure = group.some((l) => l.kind === 'board') ? 'boardFeet' : 'area';
  const amountOf = (l: TakeoffLine) => (measure === 'boardFeet' ? (l.boardFeet ?? pieceBoardFeet(l) * l.count) : l.areaMm2);
  const amount = group.reduce((n, l) => n + amountOf(l), 0);
  const costCents = group.reduce((n, l) => n + l.costCents, 0);
  const main = group.filter((l) => l.kind !== 'offcut').sort((a, b) => b.count - a.count)[0];
  const allowance = amount * fraction;
  const perPiece = main ? amountOf(main) / main.count : 0;
  const piecesReady = main ? main.count + wholePiecesUp(allowance / perPiece) : 0;
  return {
    material: group[0].material,
    thickness: group[0].thickness,
    measure,
    amount,
    allowance,
    costCents,
    allowanceCents: Math.round(costCents * fraction),
    stockId: main?.stockId ?? null,
    pieces: main?.count ?? 0,
    piecesReady,
    coveredReady: main ? main.free + main.heldByPlan >= piecesReady : true,
  };
}

/**
 * The takeoff of a plan: each size with board feet or area, cost and cover, then the spoilage allowance once per
 * material and thickness. A nested plan already counts exactly the pieces its parts are laid on, so the allowance
 * is only for spoiled parts and defects: `allowance` % of the material's area (sheets) or board feet (lumber), priced
 * at the same share of its cost, and rounded up to whole pieces of its main size to have ready. With a 15 %
 * allowance one sheet stays one sheet in cost ($100.00 → $115.00), and two sheets are ready.
 */
export function takeoff(sizes: TakeoffSize[], allowancePercent: number): Takeoff {
  const fraction = allowancePercent / 100;
  const lines = sizes.map(
    (s): TakeoffLine => ({
      ...s,
      boardFeet: s.kind === 'board' ? pieceBoardFeet(s) * s.count : null,
      areaMm2: s.length * s.width * s.count,
      costCents: s.costEachCents * s.count,
      covered: s.free + s.heldByPlan >= s.count,
    }),
  );
  const groups = new Map<string, TakeoffLine[]>();
  for (const l of lines) {
    const key = `${l.material.trim().toLowerCase()}|${Math.round(l.thickness * 100)}`;
    groups.set(key, [...(groups.get(key) ?? []), l]);
  }
  const allowances = [...groups.values()].map((g) => allowanceFor(g, fraction));
  const costCents = lines.reduce((n, l) => n + l.costCents, 0);
  const allowanceCents = allowances.reduce((n, a) => n + a.allowanceCents, 0);
  return {
    lines,
    allowances,
    totals: {
      costCents,
      allowanceCents,
      costWithAllowanceCents: costCents + allowanceCents,
      boardFeet: lines.reduce((n, l) => n + (l.boardFeet ?? 0), 0),
      areaMm2: lines.reduce((n, l) => n + (l.kind === 'board' ? 0 : l.areaMm2), 0),
      covered: lines.every((l) => l.covered),
      coveredReady: allowances.every((a) => a.coveredReady),
    },
  };
}
