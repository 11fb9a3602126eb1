import { describe, expect, test } from 'vitest';
import type { FillerKind, ItemTable } from './filler';
import { panelFiller } from './panel-filler';
import { stripFiller } from './strip-filler';

const table = (parts: [number, number, boolean][]): ItemTable => ({
  w: Float64Array.from(parts, (p) => p[0]),
  h: Float64Array.from(parts, (p) => p[1]),
  canRotate: Uint8Array.from(parts, (p) => (p[2] ? 1 : 0)),
  area: Float64Array.from(parts, (p) => p[0] * p[1]),
});

function fillOne(kind: FillerKind, bin: [number, number], parts: [number, number, boolean][], kerf: number, rule = 0) {
  const f = kind.create(parts.length, kerf);
  const items = table(parts);
  f.reset(bin[0], bin[1], Math.min(...parts.flat().filter((v): v is number => typeof v === 'number')));
  f.fill(
    items,
    parts.map((_, i) => i),
    parts.length,
    rule,
    Math.min(...items.area),
  );
  return { f, ...f.finish(parts.map((_, i) => 100 + i)) };
}

describe('kerf in the cut tree [derived from the contract: each cut removes exactly the kerf]', () => {
  test('a part against the origin is freed by one crosscut; the remainder starts a kerf further on', () => {
    const { tree, f } = fillOne(panelFiller, [1000, 500], [[400, 500, false]], 3);
    expect(tree).toEqual({
      type: 'cut',
      rect: { x: 0, y: 0, w: 1000, h: 500 },
      axis: 'x',
      pos: 400,
      kerf: 3,
      children: [
        { type: 'item', rect: { x: 0, y: 0, w: 400, h: 500 }, itemId: 100, rotated: false },
        { type: 'leftover', rect: { x: 403, y: 0, w: 597, h: 500 } },
      ],
    });
    expect(f.cuts).toBe(1);
  });

  test('a part that fills the sheet needs no cut at all', () => {
    const { tree, f } = fillOne(panelFiller, [1000, 500], [[1000, 500, false]], 3);
    expect(tree).toEqual({ type: 'item', rect: { x: 0, y: 0, w: 1000, h: 500 }, itemId: 100, rotated: false });
    expect(f.cuts).toBe(0);
  });

  test('a part less than a kerf short of the far edge is cut once, with no remainder', () => {
    const { tree } = fillOne(panelFiller, [1000, 500], [[998.5, 500, false]], 3);
    expect(tree).toMatchObject({ type: 'cut', axis: 'x', pos: 998.5, children: [{ type: 'item', rect: { w: 998.5 } }] });
    expect(tree.type === 'cut' && tree.children).toHaveLength(1);
  });

  test('two parts side by side are exactly a kerf apart', () => {
    const { items } = fillOne(
      panelFiller,
      [1000, 500],
      [
        [400, 500, false],
        [400, 500, false],
      ],
      3.2,
    );
    const xs = items.map((p) => p.rect.x).sort((a, b) => a - b);
    expect(xs[1] - (xs[0] + 400)).toBeCloseTo(3.2, 9);
  });

  test('a part that fits only turned is turned when it may be, never when it may not', () => {
    expect(fillOne(panelFiller, [1000, 500], [[500, 800, true]], 0).items[0]).toMatchObject({ rotated: true, rect: { w: 800, h: 500 } });
    expect(fillOne(panelFiller, [1000, 500], [[500, 800, false]], 0).items).toEqual([]);
  });
});

describe('strips', () => {
  test('parts lower than their strip get one trim rip; the strip rip runs the full length', () => {
    const { tree, items } = fillOne(
      stripFiller,
      [1000, 500],
      [
        [300, 200, false],
        [300, 150, false],
      ],
      3,
    );
    expect(items.map((p) => p.rect)).toEqual([
      { x: 0, y: 0, w: 300, h: 200 },
      { x: 303, y: 0, w: 300, h: 150 },
    ]);
    // Rip y = 200 across the whole sheet; in the strip, crosscuts at 300 and 603; the second part trimmed at 150.
    expect(tree).toMatchObject({ type: 'cut', axis: 'y', pos: 200, rect: { x: 0, w: 1000 } });
    const strip = tree.type === 'cut' ? tree.children[0] : tree;
    expect(strip).toMatchObject({ type: 'cut', axis: 'x', pos: 300, children: [{ type: 'item' }, { type: 'cut', axis: 'x', pos: 603 }] });
    const second = strip.type === 'cut' && strip.children[1]?.type === 'cut' ? strip.children[1].children[0] : null;
    expect(second).toMatchObject({
      type: 'cut',
      axis: 'y',
      pos: 150,
      children: [
        { type: 'item', itemId: 101 },
        { type: 'leftover', rect: { y: 153, h: 47 } },
      ],
    });
  });

  test('a part that opens a strip lies flat when it may turn (rule 0) and stands up under rule 1', () => {
    expect(fillOne(stripFiller, [1000, 500], [[200, 400, true]], 0, 0).items[0].rect).toMatchObject({ w: 400, h: 200 });
    expect(fillOne(stripFiller, [1000, 500], [[400, 200, true]], 0, 1).items[0].rect).toMatchObject({ w: 200, h: 400 });
  });
});

describe('replay', () => {
  test.each([
    ['panel, item-driven', panelFiller, 5],
    ['panel, space-driven', panelFiller, 16 + 7],
    ['strips', stripFiller, 1],
  ] as const)('replaying the recorded decisions rebuilds the same bin (%s)', (_label, kind, rule) => {
    const parts: [number, number, boolean][] = Array.from({ length: 30 }, (_, i) => [40 + ((i * 37) % 90), 30 + ((i * 53) % 70), i % 3 !== 0]);
    const first = fillOne(kind, [400, 300], parts, 2.4, rule);
    const seq = first.f.placed.slice(0, first.f.count);
    const how = first.f.decisions.slice(0, first.f.count);
    const again = kind.create(parts.length, 2.4);
    again.reset(400, 300, Math.min(...parts.flat().filter((v): v is number => typeof v === 'number')));
    seq.forEach((i, k) => again.replay(i, parts[i][0], parts[i][1], how[k]));
    expect(again.finish(parts.map((_, i) => 100 + i))).toEqual({ tree: first.tree, items: first.items });
  });
});
