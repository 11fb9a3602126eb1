import { describe, expect, test } from 'vitest';
import { countOf, listed } from '@/lib/plural';
import { importSummary } from './import-summary';

describe('what an import says', () => {
  test.each([
    [{ imported: 2, skipped: 0, skippedLines: [] }, 'Imported 2 rows from “vanity.csv”.'],
    [{ imported: 1, skipped: 0, skippedLines: [] }, 'Imported 1 row from “vanity.csv”.'],
    [{ imported: 2, skipped: 1, skippedLines: [16] }, 'Imported 2 rows from “vanity.csv”. Left out row 16, which has a problem.'],
    [{ imported: 1, skipped: 2, skippedLines: [3, 16] }, 'Imported 1 row from “vanity.csv”. Left out rows 3 and 16, which have problems.'],
    [{ imported: 0, skipped: 3, skippedLines: [3, 5, 16] }, 'Imported 0 rows from “vanity.csv”. Left out rows 3, 5 and 16, which have problems.'],
  ])('%j → %s', (result, text) => {
    expect(importSummary(result, 'vanity.csv')).toBe(text);
  });

  test('counts and lists read as a person writes them', () => {
    expect([countOf(1, 'size'), countOf(0, 'size'), countOf(1200, 'row'), countOf(2, 'box', 'boxes')]).toEqual([
      '1 size',
      '0 sizes',
      '1,200 rows',
      '2 boxes',
    ]);
    expect([listed([]), listed([3]), listed([3, 4]), listed(['a', 'b', 'c'])]).toEqual(['', '3', '3 and 4', 'a, b and c']);
  });
});
