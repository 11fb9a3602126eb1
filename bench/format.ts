/** Plain-text tables for the terminal. */
export function table(header: string[], rows: (string | number)[][]): string {
  const cells = [header, ...rows.map((r) => r.map(String))];
  const widths = header.map((_, c) => Math.max(...cells.map((r) => (r[c] ?? '').length)));
  const line = (r: string[]) => r.map((v, c) => (c === 0 ? v.padEnd(widths[c]) : v.padStart(widths[c]))).join('  ');
  return [line(cells[0]), widths.map((w) => '-'.repeat(w)).join('  '), ...cells.slice(1).map(line)].join('\n');
}

export const fixed = (x: number, digits = 1) => (Number.isFinite(x) ? x.toFixed(digits) : '–');
export const thousands = (n: number) => n.toLocaleString('en-US');
