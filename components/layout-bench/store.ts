/**
 * The layout bench store (zustand, framework-free): the document with undo/redo as recorded patches, and the view
 * state (selection, camera, drag preview) kept apart. A drag lives in the view until it is dropped, so a whole
 * drag is one undo step and cancelling it leaves the document untouched.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import { rotationAllowed, usableRect } from '@/lib/nesting/stock-rules';
import type { BenchDoc, BenchPiece, BenchPlacement, PartInfo } from '@/lib/layout-bench/document';
import { snapRect } from '@/lib/layout-bench/snap';

/** One undo step: placements before and after, and the pieces / unplaced lists when a re-nest replaced them. */
export interface Step {
  placements: { key: string; before: BenchPlacement | undefined; after: BenchPlacement | undefined }[];
  pieces?: { before: BenchPiece[]; after: BenchPiece[] };
  unplaced?: { before: BenchDoc['unplaced']; after: BenchDoc['unplaced'] };
}

export interface Camera {
  /** Screen position of the world origin, in px. */
  x: number;
  y: number;
  /** px per mm. */
  scale: number;
}

export interface DragPreview {
  key: string;
  piece: number;
  x: number;
  y: number;
  snappedX: number | null;
  snappedY: number | null;
}

export interface BenchView {
  selection: string[];
  camera: Camera;
  drag: DragPreview | null;
}

export interface BenchContext {
  parts: ReadonlyMap<string, PartInfo>;
  kerf: number;
}

export interface BenchState {
  doc: BenchDoc;
  past: Step[];
  future: Step[];
  /** The undo step the saved plan ends with (null: the plan as loaded): see `hasUnsavedChanges`. */
  savedAt: Step | null;
  view: BenchView;
  context: BenchContext;
  move(key: string, piece: number, x: number, y: number): void;
  nudge(keys: readonly string[], dx: number, dy: number): void;
  /** Turns the parts a quarter turn about their corner; returns the keys refused (grain or lock). */
  rotate(keys: readonly string[]): string[];
  setLocked(keys: readonly string[], locked: boolean): void;
  /** A re-nest result: one undo step. */
  replaceDoc(next: BenchDoc): void;
  undo(): void;
  redo(): void;
  /** The document as it stands now is the saved plan. */
  markSaved(): void;
  select(keys: readonly string[]): void;
  setCamera(camera: Camera): void;
  beginDrag(key: string): boolean;
  /** Proposed position of the dragged part on `piece`, snapped within `threshold` mm. */
  dragTo(piece: number, x: number, y: number, threshold: number): void;
  endDrag(): void;
  cancelDrag(): void;
}

const same = (a: BenchPlacement | undefined, b: BenchPlacement | undefined) =>
  a === b ||
  (!!a && !!b && a.piece === b.piece && a.x === b.x && a.y === b.y && a.w === b.w && a.h === b.h && a.rotated === b.rotated && a.locked === b.locked);

function apply(doc: BenchDoc, step: Step, dir: 'before' | 'after'): BenchDoc {
  const placements = { ...doc.placements };
  for (const p of step.placements) {
    const v = p[dir];
    if (v) placements[p.key] = v;
    else delete placements[p.key];
  }
  return { pieces: step.pieces ? step.pieces[dir] : doc.pieces, placements, unplaced: step.unplaced ? step.unplaced[dir] : doc.unplaced };
}

/** The rotation rule of the packer and `validatePlan`: a grain-locked part turns only on grainless stock. */
export function mayRotate(doc: BenchDoc, context: BenchContext, key: string): boolean {
  const p = doc.placements[key];
  const part = p && context.parts.get(p.partId);
  const piece = p && doc.pieces[p.piece];
  return !!part && !!piece && !p.locked && rotationAllowed(part, piece);
}

export type BenchStore = StoreApi<BenchState>;

/**
 * Whether the document differs from the saved plan: the last undo step is not the one it was saved at. (Counting
 * steps is not enough: save, undo, then one new edit is as many steps as at the save, but a different document.)
 */
export const hasUnsavedChanges = (s: Pick<BenchState, 'past' | 'savedAt'>) => (s.past.at(-1) ?? null) !== s.savedAt;

export function createBenchStore(doc: BenchDoc, context: BenchContext, camera: Camera = { x: 24, y: 24, scale: 0.1 }): BenchStore {
  return createStore<BenchState>()((set, get) => ({
    doc,
    past: [],
    future: [],
    savedAt: null,
    view: { selection: [], camera, drag: null },
    context,
    ...editActions(set, get),
    ...historyActions(set, get),
    ...viewActions(set, get),
  }));
}

type SetState = StoreApi<BenchState>['setState'];
type GetState = StoreApi<BenchState>['getState'];

/** Edits of the document: each one undo step, recording only the placements it changes. */
function editActions(set: SetState, get: GetState): Pick<BenchState, 'move' | 'nudge' | 'rotate' | 'setLocked' | 'replaceDoc'> {
  const record = (step: Step, view?: Partial<BenchView>) =>
    set({ doc: apply(get().doc, step, 'after'), past: [...get().past, step], future: [], ...(view ? { view: { ...get().view, ...view } } : {}) });
  /** Records and applies these new placements (unchanged ones are not recorded; no change, no step). */
  const commit = (changes: [string, BenchPlacement][]) => {
    const { doc } = get();
    const placements = changes.map(([key, after]) => ({ key, before: doc.placements[key], after })).filter((c) => !same(c.before, c.after));
    if (placements.length > 0) record({ placements });
  };
  const movable = (keys: readonly string[]) => keys.filter((k) => get().doc.placements[k] && !get().doc.placements[k].locked);

  return {
    move(key, piece, x, y) {
      const { doc, context } = get();
      const p = doc.placements[key];
      const target = doc.pieces[piece];
      if (!p || p.locked || !target) return;
      // A turned part whose grain must run along its length may not go onto grained stock.
      const part = context.parts.get(p.partId);
      if (p.rotated && (!part || !rotationAllowed(part, target))) return;
      commit([[key, { ...p, piece, x, y }]]);
    },
    nudge(keys, dx, dy) {
      commit(
        movable(keys).map((k) => {
          const p = get().doc.placements[k];
          return [k, { ...p, x: p.x + dx, y: p.y + dy }];
        }),
      );
    },
    rotate(keys) {
      const { doc, context } = get();
      const ok = keys.filter((k) => mayRotate(doc, context, k));
      commit(
        ok.map((k) => {
          const p = doc.placements[k];
          return [k, { ...p, w: p.h, h: p.w, rotated: !p.rotated }];
        }),
      );
      return keys.filter((k) => !ok.includes(k));
    },
    setLocked(keys, locked) {
      commit(keys.filter((k) => get().doc.placements[k]).map((k) => [k, { ...get().doc.placements[k], locked }]));
    },
    replaceDoc(next) {
      record(replacingStep(get().doc, next), { selection: [] });
    },
  };
}

/** The step from one document to another (a re-nest): every placement that differs, the pieces and the unplaced. */
function replacingStep(doc: BenchDoc, next: BenchDoc): Step {
  const keys = new Set([...Object.keys(doc.placements), ...Object.keys(next.placements)]);
  return {
    placements: [...keys].map((key) => ({ key, before: doc.placements[key], after: next.placements[key] })).filter((c) => !same(c.before, c.after)),
    pieces: { before: doc.pieces, after: next.pieces },
    unplaced: { before: doc.unplaced, after: next.unplaced },
  };
}

/** Undo and redo walk the recorded steps (a drag in progress is dropped); the saved plan is the step it ends with. */
function historyActions(set: SetState, get: GetState): Pick<BenchState, 'undo' | 'redo' | 'markSaved'> {
  return {
    markSaved() {
      set({ savedAt: get().past.at(-1) ?? null });
    },
    undo() {
      const { past, future, doc } = get();
      const step = past.at(-1);
      if (!step) return;
      set({ doc: apply(doc, step, 'before'), past: past.slice(0, -1), future: [...future, step], view: { ...get().view, drag: null } });
    },
    redo() {
      const { past, future, doc } = get();
      const step = future.at(-1);
      if (!step) return;
      set({ doc: apply(doc, step, 'after'), past: [...past, step], future: future.slice(0, -1), view: { ...get().view, drag: null } });
    },
  };
}

/** The view: selection, camera, and a drag, which stays in the view (snapped as it goes) until it is dropped. */
function viewActions(set: SetState, get: GetState): Pick<BenchState, 'select' | 'setCamera' | 'beginDrag' | 'dragTo' | 'endDrag' | 'cancelDrag'> {
  const setView = (view: Partial<BenchView>) => set({ view: { ...get().view, ...view } });
  return {
    select(keys) {
      setView({ selection: keys.filter((k) => get().doc.placements[k]) });
    },
    setCamera(camera) {
      setView({ camera });
    },
    beginDrag(key) {
      const p = get().doc.placements[key];
      if (!p || p.locked) return false;
      setView({ drag: { key, piece: p.piece, x: p.x, y: p.y, snappedX: null, snappedY: null } });
      return true;
    },
    dragTo(piece, x, y, threshold) {
      const { doc, view, context } = get();
      const drag = view.drag;
      const p = drag && doc.placements[drag.key];
      const target = doc.pieces[piece];
      if (!drag || !p || !target) return;
      const others = Object.entries(doc.placements)
        .filter(([k, o]) => k !== drag.key && o.piece === piece)
        .map(([, o]) => o);
      const snapped = snapRect({ x, y, w: p.w, h: p.h }, usableRect(target, target.trim), others, context.kerf, threshold);
      setView({ drag: { key: drag.key, piece, x: snapped.x, y: snapped.y, snappedX: snapped.snappedX, snappedY: snapped.snappedY } });
    },
    endDrag() {
      const drag = get().view.drag;
      setView({ drag: null });
      if (drag) get().move(drag.key, drag.piece, drag.x, drag.y);
    },
    cancelDrag() {
      setView({ drag: null });
    },
  };
}
