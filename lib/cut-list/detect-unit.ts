import type { LengthUnit } from '@/lib/units/parse-length';

export interface UnitGuess {
  unit: LengthUnit | null;
  /** Why, in a sentence the upload screen shows. */
  reason: string;
}

const INCH_MARKS = /["″”]|\bin\b|\binch|\d\s*[-\s]\s*\d+\s*\/\s*\d+|^\s*\d+\s*\/\s*\d+\s*$|[¼½¾⅛⅜⅝⅞]/i;
const FOOT_MARKS = /['′’]|\bft\b|\bfeet\b|\bfoot\b/i;
const METRIC_MARKS = /\d\s*(mm|cm|m)\b/i;

/**
 * How the bare numbers of a cut list are meant, from its length, width and thickness cells: unit marks first
 * (″, fractions → inches; mm, cm → millimetres), then sizes — no sheet part is thinner than 3 mm or thicker
 * than 3″, so thicknesses under 3 read as inches and over 3 as millimetres (common practice, no source).
 * Null when the cells do not say; the person chooses.
 */
export function detectUnit(cells: { lengths: readonly string[]; thicknesses: readonly string[] }): UnitGuess {
  const all = [...cells.lengths, ...cells.thicknesses].map((c) => c.trim()).filter(Boolean);
  const imperial = all.filter((c) => INCH_MARKS.test(c) || FOOT_MARKS.test(c)).length;
  const metric = all.filter((c) => METRIC_MARKS.test(c)).length;
  if (imperial > 0 && metric === 0) return { unit: 'in', reason: 'Sizes are written with inch marks or fractions.' };
  if (metric > 0 && imperial === 0) return { unit: 'mm', reason: 'Sizes are written with mm or cm.' };

  const numbers = (list: readonly string[]) => list.map((c) => Number(c.trim().replace(',', '.'))).filter((n) => Number.isFinite(n) && n > 0);
  const thick = numbers(cells.thicknesses);
  const long = numbers(cells.lengths);
  if (thick.length) {
    const median = [...thick].sort((a, b) => a - b)[Math.floor(thick.length / 2)];
    if (median < 3) return { unit: 'in', reason: `Thicknesses like ${median} are inches (no sheet part is ${median} mm thick).` };
    return { unit: 'mm', reason: `Thicknesses like ${median} are millimetres (no part is ${median}″ thick).` };
  }
  if (long.length && Math.max(...long) > 150) return { unit: 'mm', reason: 'Lengths over 150 read as millimetres.' };
  return { unit: null, reason: 'The sizes do not say whether they are inches or millimetres: choose one.' };
}
