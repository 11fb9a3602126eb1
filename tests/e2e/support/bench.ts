/** Driving the layout bench from tests: read a saved plan, pick a move that stays cuttable, drag on the canvas. */
import type { Page } from '@playwright/test';
import { layoutPieces, fitView, toScreen, type PieceFrame } from '../../../lib/layout-bench/world';

export type Rect = { x: number; y: number; w: number; h: number };
export type Placement = Rect & { partId: string; instance: number };
export type Piece = { length: number; width: number; material: string; thickness: number; placements: Placement[]; offcuts?: Rect[] };

export async function savedPlan(page: Page, planId: string): Promise<{ pieces: Piece[] }> {
  return (await (await page.request.get(`/api/plans/${planId}`)).json()).document;
}

/** A part that fits in the largest offcut of its own piece, and where that offcut is: moving it there stays cuttable. */
export function pickMove(pieces: Piece[]) {
  let best: { piece: number; part: Placement; to: Rect } | null = null;
  pieces.forEach((piece, i) => {
    for (const o of piece.offcuts ?? []) {
      const part = piece.placements.find((p) => p.w <= o.w && p.h <= o.h);
      if (part && (!best || o.w * o.h > best.to.w * best.to.h)) best = { piece: i, part, to: o };
    }
  });
  return best as { piece: number; part: Placement; to: Rect } | null;
}

/** Drags on the bench from the centre of `part` on piece `i` to where its corner would be at (x, y), in mm. */
export async function dragPart(page: Page, pieces: Piece[], i: number, part: Rect, x: number, y: number) {
  const canvas = page.getByTestId('bench-canvas').locator('canvas').first();
  await canvas.scrollIntoViewIfNeeded();
  const box = (await canvas.boundingBox())!;
  const frames: PieceFrame[] = layoutPieces(pieces);
  const view = fitView(frames, Math.floor(box.width), Math.floor(box.height));
  const from = toScreen(view, frames[i], part.x + part.w / 2, part.y + part.h / 2);
  const dest = toScreen(view, frames[i], x + part.w / 2, y + part.h / 2);
  await page.mouse.move(box.x + from.x, box.y + from.y);
  await page.mouse.down();
  await page.mouse.move(box.x + dest.x, box.y + dest.y, { steps: 15 });
  await page.mouse.up();
  return { x: box.x + from.x, y: box.y + from.y };
}
