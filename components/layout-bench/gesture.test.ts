import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { DRAG_SLOP_PX, IDLE, step, type Gesture, type GestureEvent, type PressTarget } from '@/components/layout-bench/gesture';

const camera = { x: 24, y: 24, scale: 0.5 };
// World = (screen − camera offset) / scale, as on the canvas.
const at = (sx: number, sy: number) => ({
  screen: { x: sx, y: sy },
  world: { x: (sx - camera.x) / camera.scale, y: (sy - camera.y) / camera.scale },
});
const part = (draggable = true): PressTarget => ({ key: 'side#1', draggable, corner: { x: 100, y: 50 } });
const down = (sx: number, sy: number, target: PressTarget | null, more: Partial<Extract<GestureEvent, { type: 'down' }>> = {}): GestureEvent => ({
  type: 'down',
  ...at(sx, sy),
  camera,
  target,
  additive: false,
  selection: [],
  ...more,
});
const move = (sx: number, sy: number): GestureEvent => ({ type: 'move', ...at(sx, sy) });

/** Runs events from idle; returns the last state and every effect in order. */
function play(events: GestureEvent[], from: Gesture = IDLE) {
  let state = from;
  const effects = [];
  for (const e of events) {
    const out = step(state, e);
    state = out.state;
    effects.push(...out.effects);
  }
  return { state, effects };
}

describe('the bench pointer gesture', () => {
  test('press on a part selects it and points; a small wobble and release is a click, with no drag and no undo step', () => {
    const { state, effects } = play([down(200, 100, part()), move(201, 101), { type: 'up' }]);
    expect(state).toEqual(IDLE);
    expect(effects).toEqual([{ type: 'select', keys: ['side#1'] }]);
    expect(step(IDLE, down(200, 100, part())).state.kind).toBe('pointing');
  });

  test('past the slop a press on a movable part drags it, the grabbed spot staying under the pointer; release drops it', () => {
    // Pressed at world (352, 152), the part's corner at (100, 50): grabbed 252 mm along, 102 mm across.
    const { state, effects } = play([down(200, 100, part()), move(200 + DRAG_SLOP_PX, 100), move(260, 130)]);
    expect(state).toMatchObject({ kind: 'dragging', key: 'side#1', grab: { x: 252, y: 102 } });
    expect(effects).toEqual([
      { type: 'select', keys: ['side#1'] },
      { type: 'begin-drag', key: 'side#1' },
      { type: 'drag-to', corner: { x: 106, y: 50 }, pointer: { x: 358, y: 152 } },
      { type: 'drag-to', corner: { x: 220, y: 110 }, pointer: { x: 472, y: 212 } },
    ]);
    expect(step(state, { type: 'up' })).toEqual({ state: IDLE, effects: [{ type: 'end-drag' }] });
  });

  test('Escape during a drag puts the part back; during a pan or a click it does nothing', () => {
    const dragging = play([down(200, 100, part()), move(240, 100)]).state;
    expect(step(dragging, { type: 'cancel' })).toEqual({ state: IDLE, effects: [{ type: 'cancel-drag' }] });
    const panning = play([down(10, 10, null), move(40, 10)]).state;
    expect(step(panning, { type: 'cancel' })).toEqual({ state: IDLE, effects: [] });
    expect(step(IDLE, { type: 'cancel' })).toEqual({ state: IDLE, effects: [] });
  });

  test('a press on empty space clears the selection and pans the view by the pointer’s travel', () => {
    const { state, effects } = play([down(10, 10, null, { selection: ['side#1'] }), move(40, 25), move(50, 5)]);
    expect(state.kind).toBe('panning');
    expect(effects).toEqual([
      { type: 'select', keys: [] },
      { type: 'camera', camera: { x: 54, y: 39, scale: 0.5 } },
      { type: 'camera', camera: { x: 64, y: 19, scale: 0.5 } },
    ]);
  });

  test('a locked part, a read-only bench or a shift-press pans instead of dragging; shift toggles the part in the selection', () => {
    expect(play([down(200, 100, part(false)), move(230, 100)]).state.kind).toBe('panning');
    const added = play([down(200, 100, part(), { additive: true, selection: ['shelf#2'] }), move(230, 100)]);
    expect(added.state.kind).toBe('panning');
    expect(added.effects[0]).toEqual({ type: 'select', keys: ['shelf#2', 'side#1'] });
    const removed = play([down(200, 100, part(), { additive: true, selection: ['shelf#2', 'side#1'] })]);
    expect(removed.effects).toEqual([{ type: 'select', keys: ['shelf#2'] }]);
    // A shift-press on empty space keeps the selection as it is.
    expect(play([down(10, 10, null, { additive: true, selection: ['shelf#2'] })]).effects).toEqual([]);
  });

  test('a new press while a drag is still open (its release was lost) drops that drag first', () => {
    const dragging = play([down(200, 100, part()), move(240, 100)]).state;
    expect(step(dragging, down(10, 10, null)).effects).toEqual([{ type: 'end-drag' }, { type: 'select', keys: [] }]);
  });

  test('any sequence of events: a drag begins only past the slop, every drag that begins ends exactly once, and release always returns to idle', () => {
    const event = fc.oneof(
      fc.record({
        kind: fc.constant('down' as const),
        x: fc.integer({ min: 0, max: 800 }),
        y: fc.integer({ min: 0, max: 600 }),
        hit: fc.constantFrom('part', 'locked', 'none'),
        additive: fc.boolean(),
      }),
      fc.record({ kind: fc.constant('move' as const), x: fc.integer({ min: 0, max: 800 }), y: fc.integer({ min: 0, max: 600 }) }),
      fc.constantFrom({ kind: 'up' as const }, { kind: 'cancel' as const }),
    );
    fc.assert(
      fc.property(fc.array(event, { maxLength: 40 }), (events) => {
        let state: Gesture = IDLE;
        let open = 0;
        for (const e of events) {
          const ev: GestureEvent =
            e.kind === 'down'
              ? down(e.x, e.y, e.hit === 'none' ? null : part(e.hit === 'part'), { additive: e.additive })
              : e.kind === 'move'
                ? move(e.x, e.y)
                : { type: e.kind };
          const before: Gesture = state;
          const out = step(state, ev);
          for (const fx of out.effects) {
            if (fx.type === 'begin-drag') {
              expect(before.kind).toBe('pointing');
              if (before.kind === 'pointing' && ev.type === 'move')
                expect(Math.hypot(ev.screen.x - before.screen.x, ev.screen.y - before.screen.y)).toBeGreaterThanOrEqual(DRAG_SLOP_PX);
              open++;
            }
            if (fx.type === 'end-drag' || fx.type === 'cancel-drag') open--;
            expect(open === 0 || open === 1).toBe(true);
          }
          state = out.state;
          expect(open).toBe(state.kind === 'dragging' ? 1 : 0);
          if (ev.type === 'up' || ev.type === 'cancel') expect(state).toEqual(IDLE);
        }
      }),
      { numRuns: 300, seed: 14 },
    );
  });
});
