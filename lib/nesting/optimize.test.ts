import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { inches } from '@/lib/units/length';
import { optimize } from '@/lib/nesting/optimize';
import { validatePlan } from '@/lib/nesting/validate-plan';
import { part, request, requestArb, sheet } from '@/lib/nesting/test-support';
import type { NestRequestInput, Plan } from '@/shared/schemas/nesting';

const placedCount = (plan: Plan) => plan.pieces.reduce((n, p) => n + p.placements.length, 0);

describe('optimize on random requests (fast-check)', () => {
  test('every plan passes validatePlan, accounts for every part instance and never yields more than the stock', async () => {
    await fc.assert(
      fc.asyncProperty(requestArb, async (req) => {
        const plan = await optimize(req);
        expect(validatePlan(req, plan)).toEqual([]);
        const asked = req.parts.reduce((n, p) => n + p.quantity, 0);
        expect(placedCount(plan) + plan.unplaced.length).toBe(asked);
        for (const p of plan.pieces) expect(p.figures!.yield).toBeLessThanOrEqual(1 + 1e-9);
        expect(plan.totals!.yield).toBeLessThanOrEqual(1 + 1e-9);
        // Strip plans are checked strip-shaped (≤ 3 stages, rips first) by validatePlan; their saw orders start
        // with rips once the trim crosscuts are done.
        if (req.settings?.style === 'strips') {
          for (const p of plan.pieces) {
            const firstWork = p.sawOrder!.find((s) => !s.trim);
            if (firstWork && p.sawOrder!.some((s) => !s.trim && s.kind === 'rip')) expect(firstWork.kind).toBe('rip');
          }
        }
      }),
      { numRuns: 40 },
    );
  });

  test('imperial sizes in sixteenths with a ⅛″ kerf and ¼″ trim still give valid plans (float positions)', async () => {
    const sixteenths = (mm: number) => inches(Math.round((mm / 25.4) * 16) / 16);
    const imperial = requestArb.map((r) => ({
      ...r,
      parts: r.parts.map((p) => ({ ...p, length: sixteenths(p.length), width: sixteenths(p.width) })),
      stock: r.stock.map((s) => ({ ...s, length: sixteenths(s.length), width: sixteenths(s.width) })),
      settings: { ...r.settings, kerf: inches(1 / 8), trim: r.settings?.trim ? inches(1 / 4) : 0 },
    }));
    await fc.assert(
      fc.asyncProperty(imperial, async (req) => {
        expect(validatePlan(req, await optimize(req))).toEqual([]);
      }),
      { numRuns: 20 },
    );
  });

  test('the same seed gives the same plan', async () => {
    await fc.assert(
      fc.asyncProperty(requestArb, async (req) => {
        expect(await optimize(req)).toEqual(await optimize(req));
      }),
      { numRuns: 10 },
    );
  });
});

describe('worked examples', () => {
  // [derived]: four 610 × 1220 mm panels fill a 2440 × 1220 sheet exactly (4 × 610 = 2440); with a 3.2 mm kerf
  // four need 4 × 610 + 3 × 3.2 = 2449.6 mm, so only three fit and the fourth goes on a second sheet.
  const panels = (kerf: number): NestRequestInput => request([part('panel', 610, 1220, { quantity: 4 })], [sheet('S', 2440, 1220)], { kerf });

  test('exact parts fill one sheet with zero kerf ([derived])', async () => {
    const plan = await optimize(panels(0));
    expect(plan.pieces).toHaveLength(1);
    expect(plan.totals!.yield).toBeCloseTo(1, 12);
    expect(plan.pieces[0].offcuts).toEqual([]);
    expect(plan.pieces[0].sawOrder!.map((s) => s.fence)).toEqual([610, 610, 610]);
  });

  test('the same parts with a 3.2 mm kerf need a second sheet ([derived])', async () => {
    const plan = await optimize(panels(3.2));
    expect(plan.pieces.map((p) => p.placements.length).sort()).toEqual([1, 3]);
    expect(plan.unplaced).toEqual([]);
    expect(plan.stockToBuy).toEqual([expect.objectContaining({ stockId: 'S', count: 2, cost: 120 })]);
  });

  // Strip count (RULES.md): n = ⌊(L − trims + k) / (w + k)⌋ [derived]. Strips run the full length of the sheet
  // and may not turn, so the count across the sheet is exactly n.
  test.each([
    {
      label: '48″ sheet, 11⅞″ strips, ⅛″ kerf → 4 (strip count, derived)',
      across: inches(48),
      w: inches(11 + 7 / 8),
      k: inches(1 / 8),
      trim: 0,
      n: 4,
    },
    {
      label: 'the same with ¼″ edge trim → 3 (strip count, derived)',
      across: inches(48),
      w: inches(11 + 7 / 8),
      k: inches(1 / 8),
      trim: inches(1 / 4),
      n: 3,
    },
  ])('$label', async ({ across, w, k, trim, n }) => {
    const length = inches(96);
    const req = request([part('strip', length - 2 * trim, w, { quantity: 6 })], [sheet('S', length, across, { count: 1 })], {
      kerf: k,
      trim,
      style: 'strips',
    });
    const plan = await optimize(req);
    expect(placedCount(plan)).toBe(n);
    expect(plan.unplaced.every((u) => u.reason === 'no-stock-left')).toBe(true);
    expect(validatePlan(req, plan)).toEqual([]);
  });

  test('full-length strips across any sheet number exactly ⌊(L − trims + k) / (w + k)⌋ (strip count, derived)', async () => {
    const arb = fc.record({
      across: fc.integer({ min: 200, max: 1500 }),
      w: fc.integer({ min: 40, max: 500 }),
      k: fc.constantFrom(0, 2.4, 3.2),
      trim: fc.constantFrom(0, 5, 10),
      style: fc.constantFrom('panel' as const, 'strips' as const),
    });
    await fc.assert(
      fc.asyncProperty(arb, async ({ across, w, k, trim, style }) => {
        const n = Math.floor((across - 2 * trim + k) / (w + k) + 1e-9);
        const req = request([part('strip', 1000 - 2 * trim, w, { quantity: n + 2 })], [sheet('S', 1000, across, { count: 1 })], {
          kerf: k,
          trim,
          style,
        });
        const plan = await optimize(req);
        expect(placedCount(plan)).toBe(Math.max(0, n));
      }),
      { numRuns: 40 },
    );
  });

  test('2440 mm, 600 mm parts, 3.2 mm kerf, 10 mm trim each end → 4 parts, 10.4 mm left (strip count, derived)', async () => {
    const req = request([part('door', 600, 1200, { quantity: 6 })], [sheet('S', 2440, 1220, { count: 1 })], {
      kerf: 3.2,
      trim: 10,
      minOffcutLength: 1,
      minOffcutWidth: 1,
    });
    const plan = await optimize(req);
    const [piece] = plan.pieces;
    expect(piece.placements).toHaveLength(4);
    const end = Math.max(...piece.placements.map((p) => p.x + p.w));
    expect(2440 - 10 - end).toBeCloseTo(10.4, 9);
    expect(plan.unplaced).toHaveLength(2);
  });
});

describe('parts that cannot be placed are reported, never dropped', () => {
  test.each([
    { label: 'larger than any stock even turned', p: part('big', 3000, 500, { grain: 'any' }), stock: [sheet('S', 2440, 1220)], reason: 'too-large' },
    { label: 'fits only across the grain', p: part('long', 1000, 2000), stock: [sheet('S', 2440, 1220)], reason: 'grain' },
    {
      label: 'stock on hand used up and none to buy',
      p: part('x', 2000, 1000, { quantity: 3 }),
      stock: [sheet('S', 2440, 1220, { count: 2 })],
      reason: 'no-stock-left',
    },
    {
      label: 'no stock of that material at all',
      p: part('m', 500, 300, { material: 'walnut' }),
      stock: [sheet('S', 2440, 1220)],
      reason: 'no-stock',
    },
    { label: 'no stock of that thickness', p: part('t', 500, 300, { thickness: 12 }), stock: [sheet('S', 2440, 1220)], reason: 'no-stock' },
  ])('$label → $reason', async ({ p, stock, reason }) => {
    const req = request([p], stock);
    const plan = await optimize(req);
    expect(plan.unplaced.length).toBeGreaterThan(0);
    expect(plan.unplaced.every((u) => u.reason === reason && u.message.length > 0)).toBe(true);
    expect(validatePlan(req, plan)).toEqual([]);
  });
});

describe('stock', () => {
  test('uses an offcut on the rack before a sheet of the same cost, and lists it to pull', async () => {
    const offcut = { ...sheet('O', 800, 400, { count: 1 }), kind: 'offcut' as const };
    const req = request([part('shelf', 700, 300)], [sheet('S', 2440, 1220, { count: 3 }), offcut]);
    const plan = await optimize(req);
    expect(plan.pieces.map((p) => p.stockId)).toEqual(['O']);
    expect(plan.stockToPull).toEqual([expect.objectContaining({ stockId: 'O', count: 1 })]);
    expect(plan.stockToBuy).toEqual([]);
  });

  test('lists sizes with no count as stock to buy, with their cost', async () => {
    const req = request(
      [part('side', 2000, 600, { quantity: 3 })],
      [sheet('S', 2440, 1220, { count: 1, costEach: 55 }), sheet('B', 2440, 1220, { costEach: 70 })],
    );
    const plan = await optimize(req);
    expect(validatePlan(req, plan)).toEqual([]);
    expect(plan.stockToPull).toEqual([expect.objectContaining({ stockId: 'S', count: 1, cost: 55 })]);
    expect(plan.stockToBuy).toEqual([expect.objectContaining({ stockId: 'B', count: 1, cost: 70 })]);
    expect(plan.totals!.cost).toBe(125);
  });

  test('takes no trim from a sawn offcut but does from a sheet', async () => {
    const req = request([part('p', 800, 400)], [{ ...sheet('O', 800, 400, { count: 1 }), kind: 'offcut' }], { trim: 10 });
    const plan = await optimize(req);
    expect(plan.unplaced).toEqual([]);
    expect(plan.pieces[0].placements[0]).toMatchObject({ x: 0, y: 0 });
  });
});

describe('totals', () => {
  test('count pieces by material and thickness, and yield is all part area over all stock area ([derived])', async () => {
    const req = request(
      [part('a', 1000, 500, { quantity: 2 }), part('b', 600, 400, { material: 'MDF', grain: 'any' }), part('c', 800, 300, { thickness: 12 })],
      [
        sheet('P18', 2440, 1220),
        sheet('M18', 2440, 1220, { material: 'MDF', grain: 'none', costEach: 30 }),
        sheet('P12', 2440, 1220, { thickness: 12, costEach: 45 }),
      ],
    );
    const plan = await optimize(req);
    expect(validatePlan(req, plan)).toEqual([]);
    const t = plan.totals!;
    expect(t.byMaterial.map((m) => [m.material, m.thickness, m.pieces])).toEqual([
      ['birch ply', 18, 1],
      ['MDF', 18, 1],
      ['birch ply', 12, 1],
    ]);
    const partArea = 2 * 1000 * 500 + 600 * 400 + 800 * 300;
    expect(t.partArea).toBe(partArea);
    expect(t.yield).toBeCloseTo(partArea / (3 * 2440 * 1220), 12);
    expect(t.cost).toBe(60 + 30 + 45);
    expect(t.cuts).toBe(plan.pieces.reduce((n, p) => n + p.sawOrder!.length, 0));
    expect(t.offcutArea + t.wasteArea + t.partArea).toBeCloseTo(t.stockArea, 6);
  });
});

describe('progress and cancel', () => {
  test('reports progress with pieces used, yield and cost', async () => {
    const seen: { piecesUsed: number; yield: number; cost: number; elapsedMs: number }[] = [];
    await optimize(request([part('p', 500, 400, { quantity: 10 })], [sheet('S', 2440, 1220)]), { onProgress: (p) => seen.push(p) });
    const last = seen.at(-1)!;
    expect(last.piecesUsed).toBe(1);
    expect(last.cost).toBe(60);
    expect(last.yield).toBeCloseTo((10 * 500 * 400) / (2440 * 1220), 9);
    expect(last.elapsedMs).toBeGreaterThanOrEqual(0);
  });

  test('every report counts the whole plan (every material, offcuts too), and the last one is the plan returned', async () => {
    const seen: { piecesUsed: number; yield: number; cost: number }[] = [];
    // Three groups: maple ply on an offcut and a sheet, MDF on its own sheet, and 12 mm birch.
    const req = request(
      [
        part('a', 700, 500, { quantity: 7 }),
        part('m', 900, 400, { quantity: 3, material: 'MDF' }),
        part('b', 500, 300, { quantity: 4, material: 'Birch', thickness: 12 }),
      ],
      [
        sheet('O', 800, 600, { kind: 'offcut', count: 1, costEach: 10 }),
        sheet('S', 2440, 1220),
        sheet('M', 2440, 1220, { material: 'MDF' }),
        sheet('B', 1525, 1525, { material: 'Birch', thickness: 12 }),
      ],
      { timeBudgetMs: 300 },
    );
    const plan = await optimize(req, { onProgress: (p) => seen.push(p) });
    expect(seen.length).toBeGreaterThan(0);
    // Each of the three groups needs a piece of its own from the very first report.
    for (const p of seen) expect(p.piecesUsed).toBeGreaterThanOrEqual(3);
    const last = seen.at(-1)!;
    expect(last.piecesUsed).toBe(plan.totals!.pieces);
    expect(last.yield).toBeCloseTo(plan.totals!.yield, 12);
    expect(last.cost).toBeCloseTo(plan.totals!.cost, 9);
    expect(plan.pieces.some((p) => p.kind === 'offcut')).toBe(true);
  });

  test('a cancelled run still returns a whole plan, marked cancelled', async () => {
    const ctrl = new AbortController();
    ctrl.abort();
    const req = request(
      [part('p', 500, 400, { quantity: 30 }), part('q', 300, 200, { quantity: 5, material: 'MDF' })],
      [sheet('S', 2440, 1220), sheet('M', 2440, 1220, { material: 'MDF' })],
      { timeBudgetMs: 5000 },
    );
    const plan = await optimize(req, { signal: ctrl.signal });
    expect(plan.cancelled).toBe(true);
    expect(validatePlan(req, plan)).toEqual([]);
    expect(placedCount(plan)).toBe(35);
  });

  test('a request that does not parse is refused with the field named', async () => {
    await expect(optimize(request([part('p', -5, 400)], [sheet('S', 2440, 1220)]))).rejects.toThrow(/length/);
  });
});

describe('request checks', () => {
  test.each([
    { label: 'duplicate part ids', req: request([part('p', 500, 400), part('p', 300, 200)], [sheet('S', 2440, 1220)]), message: /duplicate part id/ },
    {
      label: 'an offcut without a count',
      req: request([part('p', 500, 400)], [{ ...sheet('O', 800, 400), kind: 'offcut' as const }]),
      message: /offcut/,
    },
    {
      label: 'more part instances than one Nest takes',
      req: request([part('p', 50, 40, { quantity: 30_000 })], [sheet('S', 2440, 1220)]),
      message: /at most 20000/,
    },
  ])('refuses $label with a clear message', async ({ req, message }) => {
    await expect(optimize(req)).rejects.toThrow(message);
  });
});
