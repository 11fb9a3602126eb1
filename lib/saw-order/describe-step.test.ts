import { describe, expect, test } from 'vitest';
import type { ShopUnits } from '@/shared/schemas/units';
import { describeSawOrder, describeStep, partInstanceLabels, stockPieceTitle } from './describe-step';
import { carcassRequest, nest, stripsRequest } from './test-plans';

const sixteenths: ShopUnits = { system: 'imperial', precision: 16, feet: false };
const mm: ShopUnits = { system: 'metric', precision: 1, feet: false };

describe('saw-order step descriptions', () => {
  test.each([
    // Strip count (derived, lib/nesting/RULES.md): 11-7/8″ strips off a 48″ sheet with a 1/8″ kerf.
    ['strip count (derived), imperial 1/16″', sixteenths, 'hyphen', '11-7/8″', 'Rip A, fence at 11-7/8″'],
    ['strip count (derived), imperial ASCII for the PDF', sixteenths, 'ascii', '11-7/8"', 'Rip A, fence at 11-7/8"'],
    ['strip count (derived), metric (11-7/8″ = 301.625 mm, NIST 25.4 mm/in)', mm, 'hyphen', '≈302 mm', 'Rip A, fence at ≈302 mm'],
  ] as const)('%s: every fence reads the strip width', async (_label, units, style, fence, summary) => {
    const { plan } = await nest(stripsRequest());
    const steps = describeSawOrder(plan.pieces[0], units, style);
    expect(steps.map((s) => s.fence)).toEqual([fence, fence, fence, fence]);
    expect(steps[0].summary).toBe(`1. ${summary}`);
    // Each rip frees one shelf, named by its label and instance.
    expect(steps.flatMap((s) => s.frees).sort()).toEqual(['Shelf #1', 'Shelf #2', 'Shelf #3', 'Shelf #4']);
  });

  test('a rip too narrow for the fence says so, and where to cut it instead (common practice, no source)', () => {
    const step = {
      n: 3,
      kind: 'rip' as const,
      piece: 'A2',
      reference: 'low' as const,
      fence: 19,
      length: 1000,
      trim: false,
      narrow: true,
      produces: [{ name: 'A2a', x: 0, y: 0, w: 1000, h: 19, role: 'part' as const, parts: [] }],
    };
    const text = describeStep(step, new Map(), mm);
    expect(text.narrow).toBe(true);
    expect(text.summary).toBe('3. Rip A2 19 mm wide on a sled, with a track saw or on the band saw: too narrow to rip between blade and fence');
    expect(describeStep({ ...step, narrow: undefined }, new Map(), mm).summary).toBe('3. Rip A2, fence at 19 mm');
  });

  test('every part on a piece is freed by exactly one step, and trim cuts say so', async () => {
    const { plan } = await nest(carcassRequest());
    for (const piece of plan.pieces) {
      const steps = describeSawOrder(piece, sixteenths);
      const freed = steps.flatMap((s) => s.frees).sort();
      expect(freed).toEqual([...partInstanceLabels(piece).values()].sort());
      for (const [i, s] of steps.entries()) {
        expect(s.trim).toBe(piece.sawOrder![i].trim);
        if (s.trim) expect(s.summary).toMatch(/trim cut/);
      }
    }
  });

  test('a step shows the plan’s own numbers: length of cut and sizes of what it leaves', async () => {
    const { plan } = await nest(stripsRequest());
    const piece = plan.pieces[0];
    const first = describeStep(piece.sawOrder![0], partInstanceLabels(piece), sixteenths);
    expect(first.length).toBe('96″');
    expect(first.produced[0]).toMatchObject({ role: 'part', size: '96″ × 11-7/8″' });
  });

  test('the stock piece title names the kind, material, thickness and size in the shop’s unit', async () => {
    const { plan } = await nest(stripsRequest());
    // 18 mm = 0.709″ (NIST 25.4 mm/in): the nearest 1/16″ is 11/16″, marked as rounded.
    expect(stockPieceTitle(plan.pieces[0], 'A', sixteenths)).toEqual({ heading: 'Sheet A', detail: 'birch ply ≈11/16″ · 96″ × 48″' });
  });
});

describe('piece views', () => {
  test('pair every step’s words with its geometry, piece by piece, named A, B, …', async () => {
    const { pieceViews } = await import('./piece-views');
    const { plan } = await nest(carcassRequest());
    const views = pieceViews(plan.pieces, sixteenths, 3.175);
    expect(views.map((v) => v.name)).toEqual(plan.pieces.map((_, i) => String.fromCharCode(65 + i)));
    for (const [i, v] of views.entries()) {
      expect(v.steps.map((s) => s.text.n)).toEqual(plan.pieces[i].sawOrder!.map((s) => s.n));
      for (const s of v.steps) expect(s.geometry.step.n).toBe(s.text.n);
    }
  });
});
