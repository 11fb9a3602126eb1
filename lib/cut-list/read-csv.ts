import Papa from 'papaparse';

/** A CSV's cells as text, rows as the file has them (blank lines kept so line numbers match the file). */
export function readCsv(text: string): { ok: true; grid: string[][] } | { ok: false; error: string } {
  // A byte-order mark from spreadsheet exports would otherwise stick to the first header.
  const result = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: false, delimitersToGuess: [',', ';', '\t'] });
  const fatal = result.errors.find((e) => e.code === 'MissingQuotes' || e.code === 'InvalidQuotes');
  if (fatal) return { ok: false, error: `The file's quoting is broken on row ${(fatal.row ?? 0) + 1}: ${fatal.message}.` };
  const grid = result.data.map((row) => row.map((cell) => String(cell ?? '')));
  // Papaparse reads a final newline as one empty row.
  while (grid.length && grid[grid.length - 1].every((c) => c.trim() === '')) grid.pop();
  return { ok: true, grid };
}
