/**
 * The bench's pointer gesture as a small pure state machine: idle → pointing (the button is down, the pointer has
 * not moved far yet) → dragging (it went down on a part that may move) or panning (anywhere else). `step` takes a
 * state and an event and returns the next state and the effects for the store; the canvas only feeds it events and
 * applies the effects, so every path is tested without a browser.
 *
 * - A press selects at once: the part under it (shift toggles it in the selection), or nothing on empty space.
 * - A press that moves less than `DRAG_SLOP_PX` and lets go is a click: nothing is dragged, no undo step.
 * - Past the slop a press on a movable part (editable bench, not locked, no shift) drags it, keeping the spot
 *   where it was picked up under the pointer; any other press pans the view.
 * - Letting go drops the part (one undo step); cancel (Escape) puts it back; a new press starts afresh.
 */
import type { BenchStore, Camera } from '@/components/layout-bench/store';
import { pieceAt, type PieceFrame } from '@/lib/layout-bench/world';

/** How far (screen px) a press may wander and still be a click. */
export const DRAG_SLOP_PX = 3;

export interface Point {
  x: number;
  y: number;
}

/** What the press landed on: a part (its key, whether it may be dragged, its corner in world mm) or nothing. */
export interface PressTarget {
  key: string;
  draggable: boolean;
  corner: Point;
}

export type Gesture =
  | { kind: 'idle' }
  | { kind: 'pointing'; screen: Point; world: Point; camera: Camera; target: PressTarget | null }
  | { kind: 'dragging'; key: string; grab: Point }
  | { kind: 'panning'; screen: Point; camera: Camera };

export type GestureEvent =
  | { type: 'down'; screen: Point; world: Point; camera: Camera; target: PressTarget | null; additive: boolean; selection: readonly string[] }
  | { type: 'move'; screen: Point; world: Point }
  | { type: 'up' }
  | { type: 'cancel' };

export type GestureEffect =
  | { type: 'select'; keys: string[] }
  | { type: 'begin-drag'; key: string }
  /** The dragged part's corner in world mm, and the pointer (which picks the piece it is over). */
  | { type: 'drag-to'; corner: Point; pointer: Point }
  | { type: 'end-drag' }
  | { type: 'cancel-drag' }
  | { type: 'camera'; camera: Camera };

export const IDLE: Gesture = { kind: 'idle' };

const far = (a: Point, b: Point) => Math.hypot(a.x - b.x, a.y - b.y) >= DRAG_SLOP_PX;

/** The selection after a press: shift toggles the part, a plain press selects it alone, empty space clears. */
function pressSelection(target: PressTarget | null, additive: boolean, selection: readonly string[]): string[] | null {
  if (!target) return additive ? null : [];
  if (!additive) return [target.key];
  return selection.includes(target.key) ? selection.filter((k) => k !== target.key) : [...selection, target.key];
}

export function step(state: Gesture, event: GestureEvent): { state: Gesture; effects: GestureEffect[] } {
  switch (event.type) {
    case 'down': {
      // A press always starts afresh; a drag left open (a lost pointer-up) is dropped first.
      const effects: GestureEffect[] = state.kind === 'dragging' ? [{ type: 'end-drag' }] : [];
      const keys = pressSelection(event.target, event.additive, event.selection);
      if (keys) effects.push({ type: 'select', keys });
      const target = event.target && event.target.draggable && !event.additive ? event.target : null;
      return { state: { kind: 'pointing', screen: event.screen, world: event.world, camera: event.camera, target }, effects };
    }
    case 'move': {
      if (state.kind === 'pointing') {
        if (!far(state.screen, event.screen)) return { state, effects: [] };
        if (state.target) {
          const grab = { x: state.world.x - state.target.corner.x, y: state.world.y - state.target.corner.y };
          return {
            state: { kind: 'dragging', key: state.target.key, grab },
            effects: [
              { type: 'begin-drag', key: state.target.key },
              { type: 'drag-to', corner: { x: event.world.x - grab.x, y: event.world.y - grab.y }, pointer: event.world },
            ],
          };
        }
        const panning: Gesture = { kind: 'panning', screen: state.screen, camera: state.camera };
        return { state: panning, effects: [panTo(panning, event.screen)] };
      }
      if (state.kind === 'dragging')
        return {
          state,
          effects: [{ type: 'drag-to', corner: { x: event.world.x - state.grab.x, y: event.world.y - state.grab.y }, pointer: event.world }],
        };
      if (state.kind === 'panning') return { state, effects: [panTo(state, event.screen)] };
      return { state, effects: [] };
    }
    case 'up':
      return { state: IDLE, effects: state.kind === 'dragging' ? [{ type: 'end-drag' }] : [] };
    case 'cancel':
      return { state: IDLE, effects: state.kind === 'dragging' ? [{ type: 'cancel-drag' }] : [] };
  }
}

function panTo(state: { screen: Point; camera: Camera }, screen: Point): GestureEffect {
  return {
    type: 'camera',
    camera: { ...state.camera, x: state.camera.x + screen.x - state.screen.x, y: state.camera.y + screen.y - state.screen.y },
  };
}

/**
 * Applies a step's effects to the bench store. A dragged part goes onto the piece under the pointer (or stays on
 * its own when the pointer is between pieces), its corner in that piece's coordinates, snapped within `snapPx`
 * screen pixels.
 */
export function applyGestureEffects(store: BenchStore, frames: readonly PieceFrame[], effects: readonly GestureEffect[], snapPx: number): void {
  for (const fx of effects) {
    const s = store.getState();
    switch (fx.type) {
      case 'select':
        s.select(fx.keys);
        break;
      case 'begin-drag':
        s.beginDrag(fx.key);
        break;
      case 'drag-to': {
        const drag = s.view.drag;
        if (!drag) break;
        const frame = pieceAt(frames, fx.pointer.x, fx.pointer.y) ?? frames[drag.piece];
        s.dragTo(frame.piece, fx.corner.x - frame.x, fx.corner.y - frame.y, snapPx / s.view.camera.scale);
        break;
      }
      case 'end-drag':
        s.endDrag();
        break;
      case 'cancel-drag':
        s.cancelDrag();
        break;
      case 'camera':
        s.setCamera(fx.camera);
        break;
    }
  }
}
