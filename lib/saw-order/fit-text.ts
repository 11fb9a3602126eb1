/**
 * Fitting text into a fixed width (PDF cells, part tags) without losing what matters: lengths are never cut short
 * (they shrink or wrap whole), a name may be abbreviated but keeps the "#n" that tells its copies apart. Pure: the
 * caller passes how wide a text is at a size (the shipped PDF font's widths, lib/pdf/measure.ts).
 */

/** Width of `text` at font `size`, in the same unit as the widths it is fitted to. */
export type Measure = (text: string, size: number) => number;

export const ELLIPSIS = '…';

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
 * A name and the suffix that must stay whole (" #3"), on at most `maxLines` lines of `width`: the text wraps and
 * shrinks from `size` towards `min` until every line fits (the suffix stays on the last word's line). Only if even
 * that fails is the name abbreviated with "…" before the suffix, so the cut shows; the suffix is never touched.
 * Every line returned fits `width` at the size returned.
 */
export function fitLines(
  name: string,
  suffix: string,
  measure: Measure,
  size: number,
  width: number,
  maxLines: number,
  min: number,
): { lines: string[]; size: number; abbreviated: boolean } {
  const glue = (n: string) => (suffix ? `${n.trimEnd()}${suffix.replace(/^ /, '\u00a0')}` : n);
  const fits = (r: { lines: string[]; size: number }) => r.lines.length <= maxLines && r.lines.every((l) => measure(l, r.size) <= width);
  const nbsp = (r: { lines: string[]; size: number }) => ({ lines: r.lines.map((l) => l.replace(/\u00a0/g, ' ')), size: r.size });
  const whole = wrapToFit(glue(name), measure, size, width, maxLines, min);
  if (fits(whole)) return { ...nbsp(whole), abbreviated: false };
  // The longest start of the name that, with "…" and the suffix, fits the lines at `min`.
  const at = (n: number) => wrapToFit(glue(`${name.slice(0, n).trimEnd()}${ELLIPSIS}`), measure, min, width, maxLines, min);
  let lo = 0;
  let hi = name.length;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (fits(at(mid))) lo = mid;
    else hi = mid - 1;
  }
  const short = at(lo);
  if (fits(short)) return { ...nbsp(short), abbreviated: true };
  // Even "…#3" too wide: the suffix alone, shrunk as far as it must.
  const alone = suffix.trimStart();
  return { lines: [alone], size: shrinkToFit(alone, measure, min, width, 1), abbreviated: true };
}
