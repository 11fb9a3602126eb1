import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { createBenchStore, hasUnsavedChanges, type BenchStore } from '@/lib/layout-bench/store';
import type { BenchDoc, PartInfo } from '@/lib/layout-bench/document';

const piece = (grain: 'along-length' | 'none') => ({
  stockId: `s-${grain}`,
  kind: 'sheet' as const,
  length: 2440,
  width: 1220,
  thickness: 18,
  material: 'ply',
  trim: 0,
  grain,
});
const partInfo = (id: string, grain: 'along-length' | 'any'): PartInfo => ({
  id,
  label: id,
  length: 600,
  width: 300,
  grain,
  material: 'ply',
  thickness: 18,
});

function startDoc(): BenchDoc {
  const placements: BenchDoc['placements'] = {};
  for (let i = 0; i < 6; i++) {
    const partId = i % 2 ? 'side' : 'shelf';
    placements[`${partId}#${i + 1}`] = {
      partId,
      instance: i + 1,
      label: partId,
      piece: i % 2,
      x: (i % 3) * 610,
      y: 0,
      w: 600,
      h: 300,
      rotated: false,
      locked: false,
    };
  }
  return { pieces: [piece('along-length'), piece('none')], placements, unplaced: [] };
}
const context = {
  kerf: 3.2,
  parts: new Map([
    ['side', partInfo('side', 'along-length')],
    ['shelf', partInfo('shelf', 'any')],
  ]),
};
const KEYS = Object.keys(startDoc().placements);

type Cmd =
  | { t: 'move'; k: number; piece: number; x: number; y: number }
  | { t: 'nudge'; k: number; dx: number; dy: number }
  | { t: 'rotate'; k: number }
  | { t: 'lock'; k: number; on: boolean }
  | { t: 'drag'; k: number; x: number; y: number; cancel: boolean }
  | { t: 'undo' }
  | { t: 'redo' };

const cmd: fc.Arbitrary<Cmd> = fc.oneof(
  fc.record({
    t: fc.constant('move' as const),
    k: fc.nat(5),
    piece: fc.nat(1),
    x: fc.integer({ min: 0, max: 1800 }),
    y: fc.integer({ min: 0, max: 900 }),
  }),
  fc.record({ t: fc.constant('nudge' as const), k: fc.nat(5), dx: fc.constantFrom(-1, 0, 1, 10), dy: fc.constantFrom(-1, 0, 1, 10) }),
  fc.record({ t: fc.constant('rotate' as const), k: fc.nat(5) }),
  fc.record({ t: fc.constant('lock' as const), k: fc.nat(5), on: fc.boolean() }),
  fc.record({
    t: fc.constant('drag' as const),
    k: fc.nat(5),
    x: fc.integer({ min: 0, max: 1800 }),
    y: fc.integer({ min: 0, max: 900 }),
    cancel: fc.boolean(),
  }),
  fc.constant({ t: 'undo' as const }),
  fc.constant({ t: 'redo' as const }),
);

function run(store: BenchStore, c: Cmd) {
  const s = store.getState();
  const key = 'k' in c ? KEYS[c.k] : '';
  switch (c.t) {
    case 'move':
      return s.move(key, c.piece, c.x, c.y);
    case 'nudge':
      return s.nudge([key], c.dx, c.dy);
    case 'rotate':
      return void s.rotate([key]);
    case 'lock':
      return s.setLocked([key], c.on);
    case 'drag':
      if (!s.beginDrag(key)) return;
      store.getState().dragTo(store.getState().doc.placements[key].piece, c.x, c.y, 20);
      return c.cancel ? store.getState().cancelDrag() : store.getState().endDrag();
    case 'undo':
      return s.undo();
    case 'redo':
      return s.redo();
  }
}

describe('the bench store', () => {
  test('any sequence of moves, rotations, locks, drags, undos and redos keeps the document consistent', () => {
    fc.assert(
      fc.property(fc.array(cmd, { maxLength: 40 }), (cmds) => {
        const start = startDoc();
        const store = createBenchStore(start, context);
        for (const c of cmds) {
          run(store, c);
          const { doc } = store.getState();
          // No placement lost or duplicated; every placement stays keyed by its own part instance and on a piece.
          expect(Object.keys(doc.placements).sort()).toEqual([...KEYS].sort());
          for (const [k, p] of Object.entries(doc.placements)) {
            expect(`${p.partId}#${p.instance}`).toBe(k);
            expect(doc.pieces[p.piece]).toBeDefined();
            // Grain: a grain-locked part is never turned on grained stock.
            if (p.rotated && p.partId === 'side') expect(doc.pieces[p.piece].grain).toBe('none');
          }
          expect(store.getState().view.drag).toBeNull();
        }
        // Undo all returns the start; redoing as many steps as were undone returns the end (any steps undone
        // within the sequence stay on the redo list beyond it).
        const end = store.getState().doc;
        const steps = store.getState().past.length;
        while (store.getState().past.length) store.getState().undo();
        expect(store.getState().doc).toEqual(start);
        for (let i = 0; i < steps; i++) store.getState().redo();
        expect(store.getState().doc).toEqual(end);
      }),
      { numRuns: 200 },
    );
  });

  test('a whole drag is one undo step, and a cancelled drag leaves nothing to undo', () => {
    const store = createBenchStore(startDoc(), context);
    const s = store.getState();
    s.beginDrag('shelf#1');
    for (let x = 0; x < 500; x += 50) store.getState().dragTo(0, x, 600, 0);
    store.getState().endDrag();
    expect(store.getState().past).toHaveLength(1);
    expect(store.getState().doc.placements['shelf#1']).toMatchObject({ x: 450, y: 600 });
    store.getState().beginDrag('shelf#1');
    store.getState().dragTo(0, 1000, 0, 0);
    store.getState().cancelDrag();
    expect(store.getState().past).toHaveLength(1);
    store.getState().undo();
    expect(store.getState().doc.placements['shelf#1']).toMatchObject({ x: 0, y: 0 });
  });

  test('a locked part is neither dragged, nudged nor turned', () => {
    const store = createBenchStore(startDoc(), context);
    store.getState().setLocked(['shelf#1'], true);
    expect(store.getState().beginDrag('shelf#1')).toBe(false);
    store.getState().nudge(['shelf#1'], 5, 5);
    expect(store.getState().rotate(['shelf#1'])).toEqual(['shelf#1']);
    expect(store.getState().doc.placements['shelf#1']).toMatchObject({ x: 0, y: 0, rotated: false, locked: true });
  });

  test.each([
    // lib/nesting/RULES.md: a grain-locked part turns only on grainless stock; a part with grain "any" may turn.
    ['a grain-locked side on grained plywood', 'side#2', 0, false],
    ['a grain-locked side on grainless MDF', 'side#2', 1, true],
    ['a shelf whose grain may run either way', 'shelf#1', 0, true],
  ])('rotating %s: turned = %s', (_l, key, pieceIndex, turns) => {
    const store = createBenchStore(startDoc(), context);
    store.getState().move(key, pieceIndex, 0, 600);
    const refused = store.getState().rotate([key]);
    expect(refused.length === 0).toBe(turns);
    expect(store.getState().doc.placements[key].rotated).toBe(turns);
    if (turns) expect(store.getState().doc.placements[key]).toMatchObject({ w: 300, h: 600 });
  });

  test('a new change after an undo clears the redo list', () => {
    const store = createBenchStore(startDoc(), context);
    store.getState().nudge(['shelf#1'], 1, 0);
    store.getState().undo();
    expect(store.getState().future).toHaveLength(1);
    store.getState().nudge(['shelf#1'], 0, 1);
    expect(store.getState().future).toHaveLength(0);
  });

  test('unsaved changes follow the document, not the number of steps: save → undo → a new edit is unsaved; redo back to the save is not', () => {
    const store = createBenchStore(startDoc(), context);
    const s = () => store.getState();
    expect(hasUnsavedChanges(s())).toBe(false);
    s().nudge(['shelf#1'], 1, 0);
    s().nudge(['shelf#1'], 1, 0);
    s().markSaved();
    expect(hasUnsavedChanges(s())).toBe(false);
    s().undo();
    expect(hasUnsavedChanges(s())).toBe(true);
    s().redo();
    expect(hasUnsavedChanges(s())).toBe(false);
    s().undo();
    // As many steps as at the save, but another document (the bug: this read as nothing to save).
    s().nudge(['shelf#1'], 0, 1);
    expect(s().past).toHaveLength(2);
    expect(hasUnsavedChanges(s())).toBe(true);
    s().undo();
    s().undo();
    expect(hasUnsavedChanges(s())).toBe(true);
  });

  test('a drag snaps the part one kerf from its neighbour', () => {
    const store = createBenchStore(startDoc(), context);
    store.getState().beginDrag('shelf#3');
    // shelf#1 sits at x 0..600 on piece 0 (shelf#5 at 610); drop shelf#3 nearer one kerf past shelf#1.
    store.getState().dragTo(0, 605, 2, 20);
    expect(store.getState().view.drag).toMatchObject({ x: 603.2, y: 0 });
  });
});

test('a grain-locked part turned on grainless stock cannot be moved onto grained stock', () => {
  const store = createBenchStore(startDoc(), context);
  store.getState().rotate(['side#2']);
  store.getState().move('side#2', 0, 0, 600);
  expect(store.getState().doc.placements['side#2']).toMatchObject({ piece: 1, rotated: true });
});
