import { describe, expect, test } from 'vitest';
import {
  BENCH_COMMANDS,
  ariaKeys,
  commandForKey,
  commandsFor,
  formatChord,
  keyHints,
  pressKey,
  type CommandHost,
  type KeyPress,
} from '@/components/layout-bench/commands';
import type { BenchDoc, PartInfo } from '@/lib/layout-bench/document';
import { createBenchStore } from '@/components/layout-bench/store';

const piece = {
  stockId: 's',
  kind: 'sheet' as const,
  length: 2440,
  width: 1220,
  thickness: 18,
  material: 'ply',
  trim: 0,
  grain: 'along-length' as const,
};
const info = (id: string, grain: 'along-length' | 'any'): PartInfo => ({
  id,
  label: id,
  length: 600,
  width: 300,
  grain,
  material: 'ply',
  thickness: 18,
});
const doc = (): BenchDoc => ({
  pieces: [piece],
  placements: {
    'side#1': { partId: 'side', instance: 1, label: 'side', piece: 0, x: 0, y: 0, w: 600, h: 300, rotated: false, locked: false },
    'shelf#1': { partId: 'shelf', instance: 1, label: 'shelf', piece: 0, x: 700, y: 0, w: 600, h: 300, rotated: false, locked: false },
  },
  unplaced: [],
});

function bench(more: Partial<CommandHost> = {}) {
  const store = createBenchStore(doc(), {
    kerf: 3.2,
    parts: new Map([
      ['side', info('side', 'along-length')],
      ['shelf', info('shelf', 'any')],
    ]),
  });
  const calls: string[] = [];
  const host: CommandHost = {
    store,
    editable: true,
    renesting: false,
    saving: false,
    checkPending: false,
    problems: 0,
    notify: (m) => calls.push(`notify: ${m}`),
    save: () => calls.push('save'),
    renest: () => calls.push('renest'),
    fit: () => calls.push('fit'),
    cancelGesture: () => false,
    ...more,
  };
  return { store, host, calls };
}
const key = (k: string, mods: Partial<KeyPress> = {}): KeyPress => ({
  key: k,
  ctrlKey: false,
  metaKey: false,
  shiftKey: false,
  altKey: false,
  ...mods,
});
const byId = (id: string) => BENCH_COMMANDS.find((c) => c.id === id)!;

describe('the bench commands table', () => {
  test('every command has its own id, and no key is claimed by two commands', () => {
    expect(new Set(BENCH_COMMANDS.map((c) => c.id)).size).toBe(BENCH_COMMANDS.length);
    const chords = BENCH_COMMANDS.flatMap((c) =>
      c.keys.map((k) => `${k.mod ? 'mod+' : ''}${k.shift === undefined ? '*' : k.shift ? 'shift+' : ''}${k.key.toLowerCase()}`),
    );
    expect(new Set(chords).size).toBe(chords.length);
  });

  test.each([
    [key('z', { ctrlKey: true }), 'undo'],
    [key('z', { metaKey: true }), 'undo'],
    [key('Z', { ctrlKey: true, shiftKey: true }), 'redo'],
    [key('y', { ctrlKey: true }), 'redo'],
    [key('r'), 'turn'],
    [key('R', { shiftKey: true }), 'turn'],
    [key('l'), 'lock'],
    [key('f'), 'fit'],
    [key('s', { metaKey: true }), 'save'],
    [key('Escape'), 'cancel'],
    [key('ArrowLeft'), 'nudge-left'],
    [key('ArrowDown', { shiftKey: true }), 'nudge-down-far'],
  ])('%o runs %s', (press, id) => {
    expect(commandForKey(BENCH_COMMANDS, press)?.id).toBe(id);
  });

  test('a plain letter is not its Ctrl chord, and Alt chords are left to the browser', () => {
    expect(commandForKey(BENCH_COMMANDS, key('z'))).toBeUndefined();
    expect(commandForKey(BENCH_COMMANDS, key('r', { ctrlKey: true }))).toBeUndefined();
    expect(commandForKey(BENCH_COMMANDS, key('ArrowLeft', { altKey: true }))).toBeUndefined();
  });

  test('the keys move, turn, lock and undo on the store, as the buttons do', () => {
    const { store, host } = bench();
    store.getState().select(['shelf#1']);
    expect(pressKey(BENCH_COMMANDS, host, key('ArrowRight'))).toBe(true);
    expect(pressKey(BENCH_COMMANDS, host, key('ArrowDown', { shiftKey: true }))).toBe(true);
    expect(store.getState().doc.placements['shelf#1']).toMatchObject({ x: 701, y: 10 });
    byId('turn').run(host);
    expect(store.getState().doc.placements['shelf#1']).toMatchObject({ w: 300, h: 600, rotated: true });
    pressKey(BENCH_COMMANDS, host, key('l'));
    expect(byId('lock').label(host)).toBe('Unlock');
    expect(byId('nudge-left').enabled(host)).toBe(false);
    pressKey(BENCH_COMMANDS, host, key('z', { ctrlKey: true }));
    pressKey(BENCH_COMMANDS, host, key('z', { ctrlKey: true }));
    expect(store.getState().doc.placements['shelf#1']).toMatchObject({ x: 701, y: 10, rotated: false, locked: false });
    byId('redo').run(host);
    expect(store.getState().doc.placements['shelf#1'].rotated).toBe(true);
  });

  test('turning a part whose grain must run along its length on grained stock is refused, with the reason told', () => {
    // lib/nesting/RULES.md: a grain-locked part turns only on grainless stock.
    const { store, host, calls } = bench();
    store.getState().select(['side#1']);
    expect(byId('turn').enabled(host)).toBe(false);
    store.getState().select(['side#1', 'shelf#1']);
    expect(byId('turn').enabled(host)).toBe(true);
    byId('turn').run(host);
    expect(calls).toEqual([expect.stringMatching(/^notify: 1 part not turned: locked, or the grain/)]);
    expect(store.getState().doc.placements['side#1'].rotated).toBe(false);
  });

  test('Save is enabled only with unsaved changes, no problems, and the check answered', () => {
    const { store, host } = bench();
    const save = byId('save');
    expect(save.enabled(host)).toBe(false);
    store.getState().nudge(['side#1'], 1, 0);
    expect(save.enabled(host)).toBe(true);
    expect(save.enabled({ ...host, checkPending: true })).toBe(false);
    expect(save.enabled({ ...host, problems: 2 })).toBe(false);
    expect(save.enabled({ ...host, saving: true })).toBe(false);
    expect(save.label({ ...host, saving: true })).toBe('Saving…');
    store.getState().markSaved();
    expect(save.enabled(host)).toBe(false);
  });

  test('a disabled command does not run; its Ctrl chord still keeps the browser’s own action away', () => {
    const { host, calls } = bench();
    expect(pressKey(BENCH_COMMANDS, host, key('s', { ctrlKey: true }))).toBe(true);
    expect(calls).toEqual([]);
    // An arrow with nothing selected does nothing and lets the page scroll.
    expect(pressKey(BENCH_COMMANDS, host, key('ArrowUp'))).toBe(false);
    expect(byId('renest').enabled({ ...host, renesting: true })).toBe(false);
  });

  test('Escape cancels a drag under way, and otherwise clears the selection', () => {
    const { store, host } = bench({ cancelGesture: () => true });
    store.getState().select(['side#1']);
    pressKey(BENCH_COMMANDS, host, key('Escape'));
    expect(store.getState().view.selection).toEqual(['side#1']);
    pressKey(BENCH_COMMANDS, { ...host, cancelGesture: () => false }, key('Escape'));
    expect(store.getState().view.selection).toEqual([]);
  });

  test('a read-only bench offers only the commands that change nothing: its toolbar is Fit all', () => {
    const readOnly = commandsFor(false);
    expect(readOnly.filter((c) => c.button).map((c) => c.id)).toEqual(['fit']);
    expect(commandForKey(readOnly, key('z', { ctrlKey: true }))).toBeUndefined();
    expect(
      commandsFor(true)
        .filter((c) => c.button)
        .map((c) => byId(c.id).label(bench().host)),
    ).toEqual(['Undo', 'Redo', 'Turn', 'Lock', 'Re-nest unlocked', 'Fit all', 'Save layout']);
  });

  test('the key line and the buttons’ shortcuts are written from the same keys', () => {
    expect(formatChord({ key: 'z', mod: true, shift: true })).toBe('Ctrl/Cmd+Shift+Z');
    expect(ariaKeys(byId('undo'))).toBe('Control+Z Meta+Z');
    expect(ariaKeys(byId('renest'))).toBeUndefined();
    expect(keyHints(commandsFor(true)).map((h) => h.keys)).toEqual(['Arrows', 'Ctrl/Cmd+Z', 'Ctrl/Cmd+Shift+Z', 'R', 'L', 'F', 'Ctrl/Cmd+S']);
    expect(keyHints(commandsFor(false)).map((h) => h.keys)).toEqual(['F']);
  });
});
