import { describe, expect, test } from 'vitest';
import { fitLabel } from '@/lib/layout-bench/labels';

describe('part labels at any zoom', () => {
  test.each([
    ['a part large on screen shows name and size', 200, 60, ['Base side', '34-1/2" × 23"']],
    ['a narrow strip shows the name alone', 200, 20, ['Base side']],
    ['a small part shows a shortened name in a smaller face', 52, 14, ['Base si…']],
    ['a speck shows nothing', 10, 4, null],
  ])('%s', (_l, w, h, lines) => {
    const fit = fitLabel('Base side', '34-1/2" × 23"', w, h);
    expect(fit?.lines ?? null).toEqual(lines);
  });

  test('text never gets smaller than 8 px, so what is shown can be read', () => {
    for (let w = 1; w < 300; w += 7)
      for (let h = 1; h < 80; h += 5) {
        const fit = fitLabel('Stretcher', '34" × 4"', w, h);
        if (fit) expect(fit.fontPx).toBeGreaterThanOrEqual(8);
      }
  });
});
