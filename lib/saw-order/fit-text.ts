/**
 * Fitting text into a fixed width (PDF cells, part tags) without losing what matters: lengths are never cut short
 * (they shrink or wrap whole), a name may be abbreviated but keeps the "#n" that tells its copies apart. Pure: the
 * caller passes how wide a text is at a size (pdf-lib's `font.widthOfTextAtSize`, or an estimate for the screen).
 */

/** Width of `text` at font `size`, in the same unit as the widths it is fitted to. */
export type Measure = (text: string, size: number) => number;

const ELLIPSIS = '...';

/** The largest size from `size` down (in steps of 0.25) at which `text` fits `width`; never below `min`, never shorter text. */
export function shrinkToFit(text: string, measure: Measure, size: number, width: number, min = 4): number {
  let s = size;
  while (s > min && measure(text, s) > width) s = Math.max(min, Math.round((s - 0.25) * 100) / 100);
  return s;
}

/**
 * Word-wraps `text` into lines no wider than `width` at `size`, at plain spaces only: a no-break space (U+00A0)
 * holds a size such as 46-1/2" x 15" together. Words are never split: a word wider than the line (a long length,
 * say) stands on a line of its own, and the caller shrinks it with `shrinkToFit`.
 */
export function wrapWords(text: string, measure: Measure, size: number, width: number): string[] {
  const words = text.split(/[ \t\n\r]+/).filter(Boolean);
  const lines: string[] = [];
  let line = '';
  for (const word of words) {
    const next = line ? `${line} ${word}` : word;
    if (line && measure(next, size) > width) {
      lines.push(line);
      line = word;
    } else line = next;
  }
  if (line) lines.push(line);
  return lines;
}

/**
 * Wraps `text` into at most `maxLines` lines, shrinking from `size` towards `min` until it does and every line fits.
 * Nothing is dropped: if even `min` is not small enough, the text takes the lines it needs (the caller makes room).
 */
export function wrapToFit(text: string, measure: Measure, size: number, width: number, maxLines: number, min = 4): { lines: string[]; size: number } {
  let s = size;
  let lines = wrapWords(text, measure, s, width);
  while (s > min && (lines.length > maxLines || lines.some((l) => measure(l, s) > width))) {
    s = Math.max(min, Math.round((s - 0.25) * 100) / 100);
    lines = wrapWords(text, measure, s, width);
  }
  return { lines, size: s };
}

/**
 * A name with a suffix that must stay whole (" #3", or a thickness): first the font shrinks, down to `min`; if the
 * whole still does not fit, the name is abbreviated with "..." before the suffix. The suffix is never touched.
 */
export function fitNameWithSuffix(
  name: string,
  suffix: string,
  measure: Measure,
  size: number,
  width: number,
  min: number,
): { text: string; size: number } {
  const whole = `${name}${suffix}`;
  const s = shrinkToFit(whole, measure, size, width, min);
  if (measure(whole, s) <= width) return { text: whole, size: s };
  // Abbreviate the name: the longest start of it that fits with "..." and the suffix.
  let lo = 0;
  let hi = name.length;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (measure(`${name.slice(0, mid).trimEnd()}${ELLIPSIS}${suffix}`, s) <= width) lo = mid;
    else hi = mid - 1;
  }
  const text = `${name.slice(0, lo).trimEnd()}${ELLIPSIS}${suffix}`;
  // Even "...#3" too wide: keep the suffix whole and let it shrink further.
  return measure(text, s) <= width ? { text, size: s } : { text: suffix.trimStart(), size: shrinkToFit(suffix.trimStart(), measure, s, width, 1) };
}
