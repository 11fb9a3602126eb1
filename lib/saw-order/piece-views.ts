/** Each stock piece of a plan ready to show: its title, and every step's words and diagram geometry side by side. */
import { stockPieceName } from '@/lib/nesting/saw-order';
import type { PlanPiece } from '@/shared/schemas/nesting';
import type { ShopUnits } from '@/shared/schemas/units';
import { describeSawOrder, stockPieceTitle, type StepText } from './describe-step';
import { sawOrderGeometry, type StepGeometry } from './step-geometry';

export interface PieceView {
  index: number;
  name: string;
  heading: string;
  detail: string;
  stock: { length: number; width: number };
  /** Where the parts lie, for faint outlines behind each step's diagram. */
  parts: { x: number; y: number; w: number; h: number }[];
  steps: { text: StepText; geometry: StepGeometry }[];
}

export function pieceViews(pieces: readonly PlanPiece[], units: ShopUnits, kerf: number): PieceView[] {
  return pieces.map((piece, index) => {
    const name = stockPieceName(index);
    const texts = describeSawOrder(piece, units);
    const geometry = sawOrderGeometry(piece, index, kerf);
    return {
      index,
      name,
      ...stockPieceTitle(piece, name, units),
      stock: { length: piece.length, width: piece.width },
      parts: piece.placements.map(({ x, y, w, h }) => ({ x, y, w, h })),
      steps: texts.map((text, i) => ({ text, geometry: geometry[i] })),
    };
  });
}
