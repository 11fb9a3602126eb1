import { describe, expect, test } from 'vitest';
import { sawProgress } from './progress';
import { nest, stripsRequest } from './test-plans';

describe('saw progress', () => {
  test('counts ticks per piece, finds the first step not done, and ignores ticks for steps that do not exist', async () => {
    const { plan } = await nest(stripsRequest());
    const pieces = [plan.pieces[0], plan.pieces[0]];
    const p = sawProgress(pieces, [
      { piece: 0, step: 1 },
      { piece: 0, step: 3 },
      { piece: 1, step: 99 },
      { piece: 7, step: 1 },
    ]);
    expect(p.pieces.map((x) => [x.done, x.total, x.next])).toEqual([
      [2, 4, 2],
      [0, 4, 1],
    ]);
    expect(p).toMatchObject({ total: 8, done: 2, finished: false });
  });

  test('is finished only when every step of every piece is ticked', async () => {
    const { plan } = await nest(stripsRequest());
    const all = plan.pieces[0].sawOrder!.map((s) => ({ piece: 0, step: s.n }));
    expect(sawProgress(plan.pieces, all)).toMatchObject({ finished: true, done: 4 });
    expect(sawProgress(plan.pieces, all)).toMatchObject({ pieces: [{ next: null }] });
    expect(sawProgress([], []).finished).toBe(false);
  });
});
