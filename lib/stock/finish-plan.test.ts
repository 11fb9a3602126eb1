import { describe, expect, test } from 'vitest';
import type { NestRequest, Plan } from '@/shared/schemas/nesting';
import { FinishChoiceError, finishOutcome, minOffcutFor } from './finish-plan';

// One 1000 × 500 mm sheet costing $50.00: part A 600 × 500 at the left, part B 400 × 200 at the top right, and the
// 400 × 300 rest as an offcut (kerf left out so the areas add up by hand).
const plan: Plan = {
  version: 1,
  pieces: [
    {
      stockId: 's1',
      kind: 'sheet',
      length: 1000,
      width: 500,
      thickness: 18,
      material: 'Baltic birch',
      trim: 0,
      placements: [
        { partId: 'A', instance: 1, label: 'Side', x: 0, y: 0, w: 600, h: 500, rotated: false },
        { partId: 'B', instance: 1, label: 'Shelf', x: 600, y: 0, w: 400, h: 200, rotated: false },
      ],
      offcuts: [{ x: 600, y: 200, w: 400, h: 300 }],
    },
  ],
  unplaced: [],
  stockToPull: [],
  stockToBuy: [],
  cancelled: false,
} as Plan;
const request = {
  stock: [{ id: 's1', grain: 'along-length', costEach: 5000 }],
  settings: { minOffcutLength: 300, minOffcutWidth: 100 },
} as unknown as NestRequest;
const min = minOffcutFor(request, { minOffcutLength: 9999, minOffcutWidth: 9999 });

describe('finishing a plan (figures worked by hand)', () => {
  test('the keepable offcut goes on the rack at its share of the sheet’s cost; a damaged part counts as spoiled', () => {
    const out = finishOutcome(plan, request, min, {
      offcuts: [{ piece: 0, index: 0, keep: true, location: 'Bin 3' }],
      damaged: [{ piece: 0, partId: 'B', instance: 1, what: 'tear-out' }],
    } as never);
    // 400 × 300 of 1000 × 500 is 24 % of $50.00 = $12.00.
    expect(out.rack).toEqual([
      {
        piece: 0,
        index: 0,
        material: 'Baltic birch',
        thickness: 18,
        length: 400,
        width: 300,
        grain: 'along-length',
        location: 'Bin 3',
        costCents: 1200,
      },
    ]);
    expect(out.damaged).toEqual([{ piece: 0, partId: 'B', instance: 1, x: 600, y: 0 }]);
    // Stock 500,000 mm²: good parts 300,000 (60 %), spoiled 80,000 (16 %), kept 120,000, waste 80,000 (16 %).
    expect(out).toMatchObject({ keptArea: 120_000, damagedArea: 80_000, yieldRatio: 0.6, wasteRatio: 0.16, spoiledRatio: 0.16 });
  });

  test('an offcut the cutter discards, or one below the plan’s minimum, stays off the rack', () => {
    expect(finishOutcome(plan, request, min, { offcuts: [{ piece: 0, index: 0, keep: false }], damaged: [] } as never).rack).toEqual([]);
    expect(finishOutcome(plan, request, { minLength: 450, minWidth: 100 }, { offcuts: [], damaged: [] }).rack).toEqual([]);
  });

  test('the minimum is the plan’s own, or the shop’s when the stored request cannot be read', () => {
    expect(min).toEqual({ minLength: 300, minWidth: 100 });
    expect(minOffcutFor(null, { minOffcutLength: 305, minOffcutWidth: 102 })).toEqual({ minLength: 305, minWidth: 102 });
  });

  test('a choice naming no offcut or part of the plan, or a part twice, is refused with the reason', () => {
    const refuse = (choices: object) => () => finishOutcome(plan, request, min, choices as never);
    expect(refuse({ offcuts: [{ piece: 0, index: 4, keep: true }], damaged: [] })).toThrow(new FinishChoiceError('Piece 1 has no offcut 5.'));
    expect(refuse({ offcuts: [], damaged: [{ piece: 0, partId: 'C', instance: 1 }] })).toThrow('Piece 1 has no part C #1.');
    const twice = { piece: 0, partId: 'A', instance: 1 };
    expect(refuse({ offcuts: [], damaged: [twice, twice] })).toThrow('Part A #1 on piece 1 is listed as damaged twice.');
  });
});
