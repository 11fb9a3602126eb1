import { boardFeet } from '@/lib/lumber/board-feet';
import { buyQuantity } from '@/lib/lumber/buy-quantity';

/** One stock size a plan uses, as the estimator reads it before quoting. */
export interface TakeoffSize {
  stockId: string;
  source: 'stock' | 'offcut' | 'buy';
  kind: 'sheet' | 'board' | 'offcut';
  material: string;
  nominalThickness: string;
  thicknessMm: number;
  lengthMm: number;
  widthMm: number;
  /** Pieces the plan lays parts on. */
  count: number;
  costEachCents: number;
  /** Free now (on hand less other plans' reservations), counting what this plan already holds. */
  availableNow: number;
}

export interface TakeoffLine extends TakeoffSize {
  /** Boards only: board feet of the pieces (on the nominal thickness for quartered stock). */
  boardFeet: number | null;
  areaMm2: number;
  costCents: number;
  /** Pieces to have ready with the shop's waste factor: count / (1 − waste), rounded up to whole pieces. */
  withWaste: number;
  costWithWasteCents: number;
  covered: boolean;
  coveredWithWaste: boolean;
}

const QUARTERS = /^\s*(\d+)\s*\/\s*4\s*$/;

/** Board feet of one board: quartered stock ("4/4") on its nominal thickness, anything else on its actual one (AHEC). */
export function pieceBoardFeet(size: Pick<TakeoffSize, 'nominalThickness' | 'thicknessMm' | 'lengthMm' | 'widthMm'>): number {
  const q = QUARTERS.exec(size.nominalThickness);
  return boardFeet({ thickness: q ? { quarters: Number(q[1]) } : { mm: size.thicknessMm }, widthMm: size.widthMm, lengthMm: size.lengthMm });
}

/**
 * Figures for each size: board feet or area, cost at the plan's count, and with the waste factor (a fraction of what
 * is bought: buy = need / (1 − waste), `lib/lumber` buyQuantity). Offcuts already on the rack are not re-bought, so
 * they carry no allowance. Covered = the stock room has that many free now; a bought size counts its free stock too.
 */
export function takeoffLines(sizes: TakeoffSize[], waste: number): { lines: TakeoffLine[]; totals: { costCents: number; costWithWasteCents: number; boardFeet: number; areaMm2: number; covered: boolean } } {
  const lines = sizes.map((s): TakeoffLine => {
    const withWaste = s.kind === 'offcut' ? s.count : buyQuantity(s.count, waste).buy;
    return {
      ...s,
      boardFeet: s.kind === 'board' ? pieceBoardFeet(s) * s.count : null,
      areaMm2: s.lengthMm * s.widthMm * s.count,
      costCents: s.costEachCents * s.count,
      withWaste,
      costWithWasteCents: s.costEachCents * withWaste,
      covered: s.availableNow >= s.count,
      coveredWithWaste: s.availableNow >= withWaste,
    };
  });
  return {
    lines,
    totals: {
      costCents: lines.reduce((n, l) => n + l.costCents, 0),
      costWithWasteCents: lines.reduce((n, l) => n + l.costWithWasteCents, 0),
      boardFeet: lines.reduce((n, l) => n + (l.boardFeet ?? 0), 0),
      areaMm2: lines.reduce((n, l) => n + (l.kind === 'board' ? 0 : l.areaMm2), 0),
      covered: lines.every((l) => l.covered),
    },
  };
}
