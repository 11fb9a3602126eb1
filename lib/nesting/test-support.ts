/** Builders shared by the nesting tests: small requests, hand-made plans, random requests for properties. */
import fc from 'fast-check';
import { rebuildCuts } from '@/lib/nesting/rebuild-cuts';
import type { NestRequestInput, Placement, Plan } from '@/shared/schemas/nesting';

type PartIn = NestRequestInput['parts'][number];
type StockIn = NestRequestInput['stock'][number];
type SettingsIn = NonNullable<NestRequestInput['settings']>;

export const part = (id: string, length: number, width: number, more: Partial<PartIn> = {}): PartIn => ({
  id,
  label: id,
  quantity: 1,
  length,
  width,
  thickness: 18,
  material: 'birch ply',
  grain: 'along-length',
  ...more,
});

export const sheet = (id: string, length: number, width: number, more: Partial<StockIn> = {}): StockIn => ({
  id,
  kind: 'sheet',
  length,
  width,
  thickness: 18,
  material: 'birch ply',
  grain: 'along-length',
  count: null,
  costEach: 60,
  ...more,
});

export const request = (parts: PartIn[], stock: StockIn[], settings: SettingsIn = {}): NestRequestInput => ({
  parts,
  stock,
  settings: { kerf: 3, trim: 0, timeBudgetMs: 0, ...settings },
});

/** A placement of instance 1 (unless given) of part `partId`, unrotated unless said. */
export const at = (partId: string, x: number, y: number, w: number, h: number, more: Partial<Placement> = {}): Placement => ({
  partId,
  instance: 1,
  label: partId,
  x,
  y,
  w,
  h,
  rotated: false,
  ...more,
});

/** A plan with one piece of stock `stockId` holding `placements`, cut tree and saw order rebuilt from them. */
export function handPlan(req: NestRequestInput, stockId: string, placements: Placement[]): Plan {
  const s = req.stock.find((x) => x.id === stockId)!;
  const trim = s.kind === 'offcut' ? 0 : (req.settings?.trim ?? 0);
  const piece = { stockId, kind: s.kind, length: s.length, width: s.width, thickness: s.thickness, material: s.material, trim, placements };
  return rebuildCuts(req, { version: 1, pieces: [piece], unplaced: [] });
}

const MATERIALS = [
  { material: 'birch ply', thickness: 18 },
  { material: 'birch ply', thickness: 12 },
  { material: 'MDF', thickness: 18 },
];

/** Random small requests: several materials and thicknesses, grain mixes, kerf, trim, style, limited stock. */
export const requestArb: fc.Arbitrary<NestRequestInput> = fc
  .record({
    parts: fc.array(
      fc.record({
        m: fc.integer({ min: 0, max: MATERIALS.length - 1 }),
        length: fc.integer({ min: 40, max: 1300 }),
        width: fc.integer({ min: 30, max: 700 }),
        quantity: fc.integer({ min: 1, max: 4 }),
        grain: fc.constantFrom('along-length' as const, 'any' as const),
      }),
      { minLength: 1, maxLength: 8 },
    ),
    stock: fc.array(
      fc.record({
        m: fc.integer({ min: 0, max: MATERIALS.length - 1 }),
        kind: fc.constantFrom('sheet' as const, 'board' as const, 'offcut' as const),
        length: fc.integer({ min: 300, max: 2440 }),
        width: fc.integer({ min: 100, max: 1220 }),
        grain: fc.constantFrom('along-length' as const, 'none' as const),
        count: fc.option(fc.integer({ min: 0, max: 3 }), { nil: null }),
        costEach: fc.integer({ min: 0, max: 90 }),
      }),
      { minLength: 0, maxLength: 4 },
    ),
    kerf: fc.constantFrom(0, 2.4, 3.2),
    trim: fc.constantFrom(0, 2, 10),
    style: fc.constantFrom('panel' as const, 'strips' as const),
    objective: fc.constantFrom('cost' as const, 'pieces' as const, 'cuts' as const),
    seed: fc.integer({ min: 1, max: 1000 }),
  })
  .map((r) => ({
    parts: r.parts.map((p, i) => ({
      id: `p${i}`,
      label: `part ${i}`,
      quantity: p.quantity,
      length: p.length,
      width: p.width,
      grain: p.grain,
      ...MATERIALS[p.m],
    })),
    stock: r.stock.map((s, i) => ({
      id: `s${i}`,
      kind: s.kind,
      length: s.length,
      width: s.width,
      grain: s.grain,
      count: s.kind === 'offcut' ? (s.count ?? 1) : s.count,
      costEach: s.costEach,
      ...MATERIALS[s.m],
    })),
    settings: { kerf: r.kerf, trim: r.trim, style: r.style, objective: r.objective, seed: r.seed, timeBudgetMs: 0 },
  }));
