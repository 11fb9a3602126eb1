/**
 * The bench's commands as data: each has an id, a label, its keys, when it is enabled and what it runs. The
 * toolbar draws its buttons from this table and the keyboard looks keys up in it, so a button and its key can never
 * disagree about what they do or when they may. Framework-free: the host (the bench editor) hands in the store and
 * the few things only it can do (save, re-nest, fit the view, tell the person something).
 */
import { hasUnsavedChanges, mayRotate, type BenchStore } from '@/components/layout-bench/store';

export const NUDGE_MM = 1;
export const BIG_NUDGE_MM = 10;

export interface CommandHost {
  store: BenchStore;
  editable: boolean;
  /** A re-nest is running in the nesting worker. */
  renesting: boolean;
  saving: boolean;
  /** The live check of the layout as it stands has not answered yet. */
  checkPending: boolean;
  problems: number;
  notify(message: string): void;
  save(): void;
  renest(): void;
  fit(): void;
  /** Cancels a pointer gesture under way (a drag puts the part back); false when there was none. */
  cancelGesture(): boolean;
}

/** A key with its modifiers: `mod` is Ctrl or Cmd; `shift` undefined means either. */
export interface KeyChord {
  key: string;
  mod?: boolean;
  shift?: boolean;
}

export type CommandId =
  | 'undo'
  | 'redo'
  | 'turn'
  | 'lock'
  | 'renest'
  | 'fit'
  | 'save'
  | 'cancel'
  | `nudge-${'left' | 'right' | 'up' | 'down'}${'' | '-far'}`;

export interface BenchCommand {
  id: CommandId;
  label(host: CommandHost): string;
  keys: KeyChord[];
  /** What the key does, for the key line under the toolbar ("turns it"). */
  hint?: string;
  /** On the toolbar: a quiet button, or the accent one; absent for keyboard-only commands. */
  button?: 'quiet' | 'accent';
  /** Only on a bench that may be changed (a draft the person may edit). */
  edits: boolean;
  enabled(host: CommandHost): boolean;
  run(host: CommandHost): void;
}

const selection = (h: CommandHost) => h.store.getState().view.selection;
const allLocked = (h: CommandHost) => selection(h).length > 0 && selection(h).every((k) => h.store.getState().doc.placements[k]?.locked);
const movable = (h: CommandHost) =>
  selection(h).some((k) => {
    const p = h.store.getState().doc.placements[k];
    return !!p && !p.locked;
  });

const NUDGES = [
  ['left', 'ArrowLeft', -1, 0],
  ['right', 'ArrowRight', 1, 0],
  ['up', 'ArrowUp', 0, -1],
  ['down', 'ArrowDown', 0, 1],
] as const;

function turn(h: CommandHost) {
  const refused = h.store.getState().rotate(selection(h));
  if (refused.length)
    h.notify(
      `${refused.length} part${refused.length === 1 ? '' : 's'} not turned: locked, or the grain must run along the part's length on this stock.`,
    );
}

export const BENCH_COMMANDS: readonly BenchCommand[] = [
  {
    id: 'undo',
    label: () => 'Undo',
    keys: [{ key: 'z', mod: true, shift: false }],
    hint: 'undoes',
    button: 'quiet',
    edits: true,
    enabled: (h) => h.store.getState().past.length > 0,
    run: (h) => h.store.getState().undo(),
  },
  {
    id: 'redo',
    label: () => 'Redo',
    keys: [
      { key: 'z', mod: true, shift: true },
      { key: 'y', mod: true },
    ],
    hint: 'redoes',
    button: 'quiet',
    edits: true,
    enabled: (h) => h.store.getState().future.length > 0,
    run: (h) => h.store.getState().redo(),
  },
  {
    id: 'turn',
    label: () => 'Turn',
    keys: [{ key: 'r' }],
    hint: 'turns it',
    button: 'quiet',
    edits: true,
    enabled: (h) => {
      const s = h.store.getState();
      return s.view.selection.some((k) => mayRotate(s.doc, s.context, k));
    },
    run: turn,
  },
  {
    id: 'lock',
    label: (h) => (allLocked(h) ? 'Unlock' : 'Lock'),
    keys: [{ key: 'l' }],
    hint: 'locks or unlocks it',
    button: 'quiet',
    edits: true,
    enabled: (h) => selection(h).length > 0,
    run: (h) => h.store.getState().setLocked(selection(h), !allLocked(h)),
  },
  { id: 'renest', label: () => 'Re-nest unlocked', keys: [], button: 'quiet', edits: true, enabled: (h) => !h.renesting, run: (h) => h.renest() },
  {
    id: 'fit',
    label: () => 'Fit all',
    keys: [{ key: 'f' }],
    hint: 'fits every piece in view',
    button: 'quiet',
    edits: false,
    enabled: () => true,
    run: (h) => h.fit(),
  },
  {
    id: 'save',
    label: (h) => (h.saving ? 'Saving…' : 'Save layout'),
    keys: [{ key: 's', mod: true }],
    hint: 'saves',
    button: 'accent',
    edits: true,
    enabled: (h) => !h.saving && !h.checkPending && h.problems === 0 && hasUnsavedChanges(h.store.getState()),
    run: (h) => h.save(),
  },
  {
    id: 'cancel',
    label: () => 'Cancel the drag, or clear the selection',
    keys: [{ key: 'Escape' }],
    edits: false,
    enabled: () => true,
    run: (h) => {
      if (!h.cancelGesture()) h.store.getState().select([]);
    },
  },
  ...NUDGES.flatMap(([dir, key, dx, dy]) =>
    ([false, true] as const).map((far): BenchCommand => {
      const mm = far ? BIG_NUDGE_MM : NUDGE_MM;
      return {
        id: `nudge-${dir}${far ? '-far' : ''}`,
        label: () => `Nudge ${dir} ${mm} mm`,
        keys: [{ key, shift: far }],
        edits: true,
        enabled: movable,
        run: (h) => h.store.getState().nudge(selection(h), dx * mm, dy * mm),
      };
    }),
  ),
];

/** The commands this bench offers: the ones that change the layout only when it may be changed. */
export const commandsFor = (editable: boolean, commands: readonly BenchCommand[] = BENCH_COMMANDS) => commands.filter((c) => editable || !c.edits);

export interface KeyPress {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
  altKey: boolean;
}

const sameKey = (a: string, b: string) => (a.length === 1 ? a.toLowerCase() === b.toLowerCase() : a === b);

export function matches(chord: KeyChord, e: KeyPress): boolean {
  return (
    !e.altKey && sameKey(chord.key, e.key) && !!chord.mod === (e.ctrlKey || e.metaKey) && (chord.shift === undefined || chord.shift === e.shiftKey)
  );
}

/** The command a key press asks for, or undefined. */
export const commandForKey = (commands: readonly BenchCommand[], e: KeyPress) => commands.find((c) => c.keys.some((k) => matches(k, e)));

/**
 * Handles a key press on the bench: runs its command when enabled. Returns whether the browser's own action
 * should be stopped — always for a Ctrl/Cmd chord of ours (no page undo, no "save page"), otherwise when it ran.
 */
export function pressKey(commands: readonly BenchCommand[], host: CommandHost, e: KeyPress): boolean {
  const command = commandForKey(commands, e);
  if (!command) return false;
  const ran = command.enabled(host);
  if (ran) command.run(host);
  return ran || e.ctrlKey || e.metaKey;
}

/** A chord as the key line shows it: "Ctrl/Cmd+Shift+Z", "R", "Esc". */
export function formatChord(chord: KeyChord): string {
  const key = chord.key === 'Escape' ? 'Esc' : chord.key.length === 1 ? chord.key.toUpperCase() : chord.key;
  return [chord.mod && 'Ctrl/Cmd', chord.shift && 'Shift', key].filter(Boolean).join('+');
}

/** `aria-keyshortcuts` for a command's keys ("Control+Z Meta+Z"). */
export function ariaKeys(command: BenchCommand): string | undefined {
  const out = command.keys.flatMap((k) => {
    const key = k.key.length === 1 ? k.key.toUpperCase() : k.key;
    const shift = k.shift ? 'Shift+' : '';
    return k.mod ? [`Control+${shift}${key}`, `Meta+${shift}${key}`] : [`${shift}${key}`];
  });
  return out.length ? out.join(' ') : undefined;
}

/** The key line under the toolbar: every command with a hint, with its first key. */
export function keyHints(commands: readonly BenchCommand[]): { keys: string; does: string }[] {
  const nudge = commands.some((c) => c.id === 'nudge-left') ? [{ keys: 'Arrows', does: `nudge it (Shift: ${BIG_NUDGE_MM} mm)` }] : [];
  return [...nudge, ...commands.filter((c) => c.hint && c.keys.length).map((c) => ({ keys: formatChord(c.keys[0]), does: c.hint! }))];
}
