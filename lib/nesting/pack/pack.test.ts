import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { packGuillotine, packWithLimits } from './index';
import { checkPackResult } from './result-check';
import type { BinType, PackItem, PackOptions } from './types';

const opts = (o: Partial<PackOptions> = {}): PackOptions => ({ kerf: 0, style: 'panel', objective: 'cost', timeBudgetMs: 60_000, seed: 7, ...o });
const sheet = (w: number, h: number, o: Partial<BinType> = {}): BinType => ({ id: 1, w, h, count: null, cost: 1, priority: 1, ...o });
const run = (items: PackItem[], stock: BinType[], o: PackOptions) => packWithLimits(items, stock, o, { maxIterations: 30 });
const parts = (n: number, w: number, h: number, canRotate = true, from = 0): PackItem[] =>
  Array.from({ length: n }, (_, i) => ({ id: from + i, w, h, canRotate }));

describe('worked examples', () => {
  test.each([
    { label: '[derived] 2440 × 1220 holds four 610 × 1220 parts exactly, kerf 0', kerf: 0, bins: 1 },
    { label: '[derived] the same four parts with a 3.2 mm kerf need 4 × 610 + 3 × 3.2 > 2440, so a second sheet', kerf: 3.2, bins: 2 },
  ])('$label', async ({ kerf, bins }) => {
    const items = parts(4, 610, 1220, false);
    const stock = [sheet(2440, 1220)];
    for (const style of ['panel', 'strips'] as const) {
      const r = await packWithLimits(items, stock, opts({ kerf, style }), { maxIterations: 20 });
      expect(checkPackResult(items, stock, { kerf, style }, r)).toEqual([]);
      expect(r.bins).toHaveLength(bins);
      expect(r.unplaced).toEqual([]);
    }
  });

  test.each([
    {
      label: 'strip count, derived: 48″ wide, 11⅞″ strips, ⅛″ kerf → ⌊(48 + ⅛)/(11⅞ + ⅛)⌋ = 4',
      width: inches(48),
      strip: inches(11.875),
      kerf: inches(0.125),
      expected: 4,
    },
    {
      label: 'strip count, derived: ¼″ edge trim on both sides leaves 47.5″ → 3',
      width: inches(47.5),
      strip: inches(11.875),
      kerf: inches(0.125),
      expected: 3,
    },
    { label: 'strip count, derived: 2440 − 2 × 10 mm trim, 600 mm strips, 3.2 mm kerf → 4', width: 2420, strip: 600, kerf: 3.2, expected: 4 },
  ])('$label', async ({ width, strip, kerf, expected }) => {
    expect(Math.floor((width + kerf) / (strip + kerf) + 1e-9)).toBe(expected);
    // One sheet whose width runs along y; full-length strips are parts as long as the sheet.
    const length = inches(96);
    const items = parts(6, length, strip, false);
    const stock = [sheet(length, width, { count: 1 })];
    for (const style of ['panel', 'strips'] as const) {
      const r = await packWithLimits(items, stock, opts({ kerf, style }), { maxIterations: 10 });
      expect(checkPackResult(items, stock, { kerf, style }, r)).toEqual([]);
      expect(r.bins[0].items).toHaveLength(expected);
      expect(r.unplaced).toHaveLength(6 - expected);
      expect(r.unplaced.every((u) => u.reason === 'no-stock-left')).toBe(true);
    }
  });

  test('a part larger than every sheet is reported too-large, and the rest still packs', async () => {
    const items = [...parts(2, 500, 400), { id: 9, w: 3000, h: 100, canRotate: true }];
    const r = await run(items, [sheet(2440, 1220)], opts());
    expect(r.unplaced).toEqual([{ itemId: 9, reason: 'too-large' }]);
    expect(r.bins.flatMap((b) => b.items.map((p) => p.itemId)).sort()).toEqual([0, 1]);
  });

  test('a part that fits only turned, with the grain forbidding it, is reported grain', async () => {
    const items = [{ id: 3, w: 1000, h: 2000, canRotate: false }];
    const r = await run(items, [sheet(2440, 1220)], opts());
    expect(r.unplaced).toEqual([{ itemId: 3, reason: 'grain' }]);
    const turned = await run([{ ...items[0], canRotate: true }], [sheet(2440, 1220)], opts());
    expect(turned.bins[0].items[0]).toMatchObject({ itemId: 3, rotated: true, rect: { w: 2000, h: 1000 } });
  });

  test('parts beyond the limited stock are reported no-stock-left, none dropped', async () => {
    const items = parts(5, 1220, 1220);
    const stock = [sheet(2440, 1220, { count: 2 })];
    const r = await run(items, stock, opts());
    expect(checkPackResult(items, stock, { kerf: 0, style: 'panel' }, r)).toEqual([]);
    expect(r.bins).toHaveLength(2);
    expect(r.unplaced).toEqual([{ itemId: expect.any(Number), reason: 'no-stock-left' }]);
  });

  test('a free offcut is cut before new stock when it costs no more [common practice, no source]', async () => {
    const items = parts(2, 400, 300);
    const stock = [sheet(2440, 1220, { id: 1, cost: 40, priority: 2 }), sheet(900, 700, { id: 2, cost: 0, priority: 0, count: 1 })];
    const r = await run(items, stock, opts());
    expect(r.bins.map((b) => b.binTypeId)).toEqual([2]);
  });

  test('fewest pieces prefers one big sheet to two small ones', async () => {
    const items = parts(4, 500, 500);
    const stock = [sheet(1100, 1100, { id: 1, cost: 10 }), sheet(1000, 520, { id: 2, cost: 1 })];
    const pieces = await run(items, stock, opts({ objective: 'pieces' }));
    expect(pieces.bins.map((b) => b.binTypeId)).toEqual([1]);
    const cost = await run(items, stock, opts({ objective: 'cost' }));
    expect(cost.bins.map((b) => b.binTypeId)).toEqual([2, 2]);
  });

  test('bad input is refused with a message naming the entry', async () => {
    await expect(packGuillotine([{ id: 1, w: -5, h: 10, canRotate: true }], [sheet(100, 100)], opts())).rejects.toThrow(/items\.0\.w/);
    await expect(
      packGuillotine(
        parts(2, 5, 5).map((p) => ({ ...p, id: 1 })),
        [sheet(100, 100)],
        opts(),
      ),
    ).rejects.toThrow(/used twice/);
  });
});

// Whole units, or sixteenths of an inch in mm, so float positions and kerf meet.
const lengthArb = fc.oneof(
  fc.integer({ min: 1, max: 120 }),
  fc.integer({ min: 16, max: 16 * 4 }).map((n) => inches(n / 16)),
);
const itemArb = fc.record({ w: lengthArb, h: lengthArb, canRotate: fc.boolean() });
const binArb = fc.record({
  w: fc.integer({ min: 40, max: 200 }),
  h: fc.integer({ min: 40, max: 200 }),
  count: fc.option(fc.integer({ min: 0, max: 3 }), { nil: null }),
  cost: fc.integer({ min: 0, max: 5 }),
  priority: fc.integer({ min: 0, max: 2 }),
});
const jobArb = fc.record({
  items: fc.array(itemArb, { minLength: 0, maxLength: 30 }),
  bins: fc.array(binArb, { minLength: 1, maxLength: 3 }),
  kerf: fc.constantFrom(0, 1, 3.2),
  style: fc.constantFrom('panel' as const, 'strips' as const),
  objective: fc.constantFrom('cost' as const, 'pieces' as const, 'cuts' as const),
  seed: fc.integer(),
});
type Job = typeof jobArb extends fc.Arbitrary<infer T> ? T : never;
const materialise = (job: Job) => ({
  items: job.items.map((it, id) => ({ id, ...it })),
  bins: job.bins.map((b, id) => ({ id, ...b })),
  options: opts({ kerf: job.kerf, style: job.style, objective: job.objective, seed: job.seed }),
});

describe('properties', () => {
  test('every result is sound: all parts placed or reported, inside, kerf apart, the tree reproduces them, strips are 3-stage', async () => {
    await fc.assert(
      fc.asyncProperty(jobArb, async (job) => {
        const { items, bins, options } = materialise(job);
        const r = await packWithLimits(items, bins, options, { maxIterations: 15 });
        expect(checkPackResult(items, bins, options, r)).toEqual([]);
      }),
      { numRuns: 120 },
    );
  });

  test('the same seed gives the same result', async () => {
    await fc.assert(
      fc.asyncProperty(jobArb, async (job) => {
        const { items, bins, options } = materialise(job);
        const a = await packWithLimits(items, bins, options, { maxIterations: 15 });
        const b = await packWithLimits(items, bins, options, { maxIterations: 15 });
        expect(b).toEqual(a);
      }),
      { numRuns: 30 },
    );
  });

  test('a part that fits some sheet is never reported too-large or grain', async () => {
    await fc.assert(
      fc.asyncProperty(jobArb, async (job) => {
        const { items, bins, options } = materialise(job);
        const r = await packWithLimits(items, bins, options, { maxIterations: 0 });
        for (const u of r.unplaced) {
          const it = items[u.itemId];
          const straight = bins.some((b) => it.w <= b.w && it.h <= b.h);
          const turned = bins.some((b) => it.h <= b.w && it.w <= b.h);
          if (u.reason === 'too-large') expect(straight || turned).toBe(false);
          if (u.reason === 'grain') expect([straight, turned, it.canRotate]).toEqual([false, true, false]);
          if (u.reason === 'no-stock-left') expect(straight || (turned && it.canRotate)).toBe(true);
        }
      }),
      { numRuns: 60 },
    );
  });
});

describe('strip count', () => {
  test('full-length strips of width w from a usable width L with kerf k number ⌊(L + k)/(w + k)⌋ (strip count, derived)', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.integer({ min: 100, max: 1500 }),
        fc.integer({ min: 20, max: 400 }),
        fc.constantFrom(0, 2.4, 3.2),
        fc.constantFrom('panel' as const, 'strips' as const),
        async (width, strip, kerf, style) => {
          const expected = Math.floor((width + kerf) / (strip + kerf) + 1e-9);
          const items = parts(expected + 2, 2440, strip, false);
          const stock = [sheet(2440, width, { count: 1 })];
          const r = await packWithLimits(items, stock, opts({ kerf, style }), { maxIterations: 5 });
          expect(checkPackResult(items, stock, { kerf, style }, r)).toEqual([]);
          expect(r.bins.flatMap((b) => b.items)).toHaveLength(expected);
        },
      ),
      { numRuns: 40 },
    );
  });
});

describe('identical parts', () => {
  const grid = (W: number, H: number, a: number, b: number, k: number) => Math.floor((W + k) / (a + k) + 1e-9) * Math.floor((H + k) / (b + k) + 1e-9);
  test('fill at least the guillotine grid ⌊(W + k)/(a + k)⌋ · ⌊(H + k)/(b + k)⌋, either way round when they may turn [derived]', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.integer({ min: 100, max: 2440 }),
        fc.integer({ min: 100, max: 1220 }),
        fc.integer({ min: 20, max: 600 }),
        fc.integer({ min: 20, max: 600 }),
        fc.constantFrom(0, 3.2),
        fc.boolean(),
        fc.constantFrom('panel' as const, 'strips' as const),
        async (W, H, a, b, k, canRotate, style) => {
          const expected = Math.max(grid(W, H, a, b, k), canRotate ? grid(W, H, b, a, k) : 0);
          fc.pre(expected > 0 && expected < 300);
          const items = parts(expected + 1, a, b, canRotate);
          const r = await packWithLimits(items, [sheet(W, H, { count: 1 })], opts({ kerf: k, style, objective: 'pieces' }), { maxIterations: 0 });
          expect(r.bins[0].items.length).toBeGreaterThanOrEqual(expected);
        },
      ),
      { numRuns: 80 },
    );
  });
});

describe('search control', () => {
  const items = Array.from({ length: 60 }, (_, id) => ({ id, w: 20 + ((id * 37) % 70), h: 15 + ((id * 53) % 80), canRotate: id % 4 !== 0 }));
  const stock = [sheet(200, 150)];

  test('an aborted signal still returns a sound best-so-far result', async () => {
    const ac = new AbortController();
    ac.abort();
    const r = await packGuillotine(items, stock, opts({ signal: ac.signal, timeBudgetMs: 60_000 }));
    expect(checkPackResult(items, stock, { kerf: 0, style: 'panel' }, r)).toEqual([]);
    expect(r.bins.length).toBeGreaterThan(0);
  });

  test('aborting mid-search returns a sound result instead of running out the budget', async () => {
    const ac = new AbortController();
    setTimeout(() => ac.abort(), 50);
    const r = await packGuillotine(items, stock, opts({ signal: ac.signal, timeBudgetMs: 60_000, kerf: 2 }));
    expect(checkPackResult(items, stock, { kerf: 2, style: 'panel' }, r)).toEqual([]);
  });

  test('progress reports carry sound results that never get worse', async () => {
    const seen: number[] = [];
    const ac = new AbortController();
    setTimeout(() => ac.abort(), 600);
    await packGuillotine(
      items,
      stock,
      opts({
        signal: ac.signal,
        onProgress: (p) => {
          expect(checkPackResult(items, stock, { kerf: 0, style: 'panel' }, p.best)).toEqual([]);
          expect(p.fill).toBeLessThanOrEqual(1);
          seen.push(p.binsUsed);
        },
      }),
    );
    expect(seen.length).toBeGreaterThan(0);
    for (let i = 1; i < seen.length; i++) expect(seen[i]).toBeLessThanOrEqual(seen[i - 1]);
  });
});
