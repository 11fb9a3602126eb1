import { describe, expect, test } from 'vitest';
import { optimize } from '@/lib/nesting';
import { part, request, sheet } from '@/lib/nesting/test-support';
import { nestRequestSchema } from '@/shared/schemas/nesting';
import { planToDoc } from '@/lib/layout-bench/document';
import { checkDoc } from '@/lib/layout-bench/live-check';

const req = nestRequestSchema.parse(
  request([part('side', 720, 560, { quantity: 3 }), part('shelf', 764, 300, { quantity: 2 })], [sheet('ply', 2440, 1220)], { kerf: 3.2, trim: 5 }),
);

describe('the live check on the bench', () => {
  test('an engine plan has no problems, and its leftovers are shaded on its piece', async () => {
    const doc = planToDoc(await optimize(req), req);
    const check = checkDoc(req, doc);
    expect(check.violations).toEqual([]);
    const left = check.leftovers.get(0)!;
    expect(left.offcuts.length + left.waste.length).toBeGreaterThan(0);
    // Yield = part area / stock area (lib/nesting/RULES.md): 3 × 720 × 560 + 2 × 764 × 300 on one 2440 × 1220 sheet.
    expect(check.totals?.yield).toBeCloseTo((3 * 720 * 560 + 2 * 764 * 300) / (2440 * 1220), 9);
  });

  test('two parts dropped on one spot are both marked where they are', async () => {
    const doc = planToDoc(await optimize(req), req);
    const [a, b] = Object.keys(doc.placements);
    doc.placements[b] = { ...doc.placements[b], piece: doc.placements[a].piece, x: doc.placements[a].x + 10, y: doc.placements[a].y };
    const check = checkDoc(req, doc);
    expect(check.violations.some((v) => v.code === 'overlap')).toBe(true);
    expect(check.byPlacement.get(a)?.[0]).toMatch(/overlap/);
    expect(check.byPlacement.get(b)?.[0]).toMatch(/overlap/);
  });

  test('a part pushed past the trimmed edge is marked outside the stock', async () => {
    const doc = planToDoc(await optimize(req), req);
    const [a] = Object.keys(doc.placements);
    doc.placements[a] = { ...doc.placements[a], x: 2440 - 100 };
    expect(checkDoc(req, doc).byPlacement.get(a)?.join(' ')).toMatch(/outside the usable area/);
  });

  test('a layout straight through-cuts cannot separate is marked on its piece', () => {
    // The pinwheel: four parts around a centre square, the classic non-guillotine layout (common practice, no source).
    const pin = nestRequestSchema.parse(
      request([part('p', 600, 200, { quantity: 4, grain: 'any' }), part('c', 200, 200, { grain: 'any' })], [sheet('s', 2440, 1220)], {
        kerf: 0,
        trim: 0,
      }),
    );
    const place = (instance: number, x: number, y: number, w: number, h: number, rotated = false) => ({
      partId: 'p',
      instance,
      label: 'p',
      piece: 0,
      x,
      y,
      w,
      h,
      rotated,
      locked: false,
    });
    const doc = {
      pieces: [
        {
          stockId: 's',
          kind: 'sheet' as const,
          length: 2440,
          width: 1220,
          thickness: 18,
          material: 'birch ply',
          trim: 0,
          grain: 'along-length' as const,
        },
      ],
      placements: {
        'p#1': place(1, 0, 0, 600, 200),
        'p#2': place(2, 600, 0, 200, 600, true),
        'p#3': place(3, 200, 600, 600, 200),
        'p#4': place(4, 0, 200, 200, 600, true),
        'c#1': { ...place(1, 200, 200, 200, 200), partId: 'c', label: 'c' },
      },
      unplaced: [],
    };
    const check = checkDoc(pin, doc);
    expect(check.violations.map((v) => v.code)).toEqual(['not-guillotine']);
    expect(check.byPiece.get(0)?.[0]).toMatch(/straight through-cuts/);
  });
});
